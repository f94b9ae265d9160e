// What the solve command line and the benchmark share: one problem or an array of them, and the
// engine's input errors told in one line that says which problem and which field.

import { EngineInputError } from '@/lib/engine';

/** A parsed document as a list of problems: a JSON array is many, anything else is one. */
export function problemList(doc: unknown): { problems: unknown[]; isArray: boolean } {
  return Array.isArray(doc) ? { problems: doc, isArray: true } : { problems: [doc], isArray: false };
}

/** "problems[1] (problem 2 of 3)": the 0-based index as in the array, then the 1-based count. */
export function problemLabel(index: number, count: number): string {
  return `problems[${index}] (problem ${index + 1} of ${count})`;
}

/**
 * One line for an error thrown while solving problem `index` of `count` (index null for a single
 * problem): the engine's "field: message" for EngineInputError, "internal error" for anything else.
 */
export function describeSolveError(err: unknown, index: number | null, count: number): string {
  const where = index === null ? '' : `${problemLabel(index, count)}: `;
  if (err instanceof EngineInputError) {
    // The engine names the whole problem "problem"; in an array the label already says which.
    const text = index !== null && err.field === 'problem' ? err.message.slice('problem: '.length) : err.message;
    return `${where}${text}`.replace(/\s*\n\s*/g, ' ');
  }
  const message = err instanceof Error ? err.message : String(err);
  return `${where}internal engine error (please report with this problem): ${message}`.replace(/\s*\n\s*/g, ' ');
}
