import { readFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { formatHoleCsv, layoutDocument } from '../../shared/layout/index.ts';

/**
 * npm run layout -- <design.json> [--format json|csv]
 * Prints the layout of a design file: the whole Layout as JSON, or the hole table as CSV.
 * Exit codes: 0 laid out, 1 the file is not a valid design (problems on stderr), 2 usage.
 */
const usage = 'Usage: npm run layout -- <design.json> [--format json|csv]';

function main(): number {
  let parsed;
  try {
    parsed = parseArgs({ allowPositionals: true, options: { format: { type: 'string', short: 'f', default: 'json' }, help: { type: 'boolean', short: 'h' } } });
  } catch (error) {
    console.error(`${(error as Error).message}\n${usage}`);
    return 2;
  }
  const { values, positionals } = parsed;
  if (values.help) {
    console.log(usage);
    return 0;
  }
  const [file] = positionals;
  if (!file || positionals.length > 1 || (values.format !== 'json' && values.format !== 'csv')) {
    console.error(usage);
    return 2;
  }
  let input: unknown;
  try {
    input = JSON.parse(readFileSync(file, 'utf8'));
  } catch (error) {
    console.error(`Cannot read ${file} as JSON: ${(error as Error).message}`);
    return 1;
  }
  const result = layoutDocument(input);
  if (!result.ok) {
    console.error(`${file} is not a valid Canwright design:`);
    for (const problem of result.problems) console.error(`  ${problem.path}: ${problem.message}`);
    return 1;
  }
  process.stdout.write(values.format === 'csv' ? formatHoleCsv(result.layout) : JSON.stringify(result.layout, null, 2) + '\n');
  return 0;
}

process.exitCode = main();
