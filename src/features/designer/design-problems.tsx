import { createContext, useContext } from 'react';

/** Each field path's problem in the form's words, from the one validation of the current values. */
export const ProblemsContext = createContext<ReadonlyMap<string, string>>(new Map());

/** The problem of one field; with `within`, the first problem of anything under that path. */
export function useProblem(path: string, within = false): string | undefined {
  return useProblems()(path, within);
}

/** A lookup of field problems by path, for an editor with many fields. */
export function useProblems(): (path: string, within?: boolean) => string | undefined {
  const problems = useContext(ProblemsContext);
  return (path, within = false) => {
    const exact = problems.get(path);
    if (exact || !within) return exact;
    for (const [key, text] of problems) if (key.startsWith(`${path}.`)) return text;
    return undefined;
  };
}
