import type { Reporter, SerializedError, TestModule } from 'vitest/node';
import '../helpers/security-counts.ts';

/**
 * Prints how many tests passed, failed and were skipped in each layer (unit, api, browser...),
 * then one closing line "N passed, N failed, N skipped" for CI logs.
 */
export default class CountsReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>, unhandledErrors: ReadonlyArray<SerializedError>): void {
    const byProject = new Map<string, { passed: number; failed: number; skipped: number }>();
    for (const module of testModules) {
      const counts = byProject.get(module.project.name) ?? { passed: 0, failed: 0, skipped: 0 };
      for (const test of module.children.allTests()) {
        const state = test.result().state;
        if (state === 'passed') counts.passed++;
        else if (state === 'failed') counts.failed++;
        else counts.skipped++;
      }
      // A file that failed to load has no tests but must still count as a failure.
      if (module.state() === 'failed' && [...module.children.allTests()].length === 0) counts.failed++;
      byProject.set(module.project.name, counts);
    }
    const figures: string[] = [];
    for (const module of testModules) for (const test of module.children.allTests()) for (const [name, text] of Object.entries(test.meta().securityCounts ?? {})) figures.push(`  ${name} (${module.project.name}): ${text}`);
    if (figures.length) console.log(['\nSecurity layer:', ...figures.sort()].join('\n'));
    const total = { passed: 0, failed: 0, skipped: 0 };
    console.log('\nTests by layer:');
    for (const [name, counts] of [...byProject].sort(([a], [b]) => a.localeCompare(b))) {
      console.log(`  ${name.padEnd(18)} ${counts.passed} passed, ${counts.failed} failed, ${counts.skipped} skipped`);
      total.passed += counts.passed;
      total.failed += counts.failed;
      total.skipped += counts.skipped;
    }
    // Errors outside any test (a failing global setup, say) fail the run too.
    if (unhandledErrors.length) console.log(`  ${'(outside tests)'.padEnd(18)} ${unhandledErrors.length} errors`);
    total.failed += unhandledErrors.length;
    console.log(`${total.passed} passed, ${total.failed} failed, ${total.skipped} skipped`);
  }
}
