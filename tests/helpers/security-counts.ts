import type { TaskMeta } from 'vitest';

declare module 'vitest' {
  interface TaskMeta {
    /** Figures a security test reports (routes x actors, fuzz bodies, cycles); printed by the counts reporter. */
    securityCounts?: Record<string, string>;
  }
}

/** Records a figure on the running test, for the counts reporter to print after the run. */
export function recordCount(task: { meta: TaskMeta }, name: string, text: string): void {
  task.meta.securityCounts = { ...task.meta.securityCounts, [name]: text };
}
