// npm run --silent solve < problem.json: the engine from the command line. Reads one problem in
// the general form (or a JSON array of them) from stdin and prints the result of solve() (or an
// array of results, in order) as one pretty-printed JSON document followed by a newline.
//
// Exit codes:
//   0  every problem was solved. A result whose status is "not_converged" is still an answer (its
//      message says why) and is printed like the others; one note line on stderr names it.
//   1  bad input: stdin empty, invalid JSON, or a problem the engine refuses (EngineInputError).
//      Nothing goes to stdout and one line to stderr, naming the field, e.g.
//        species[0].stoich.Cl-: unknown component "Cl-"; add it to components or fix the name
//      and, for an array, which problem: "problems[1] (problem 2 of 3): totals.CN-: ..."
//      (the 0-based index as in the array, then the 1-based count).
//   2  bad command line: an unknown argument, or stdin is a terminal rather than a file or pipe.
//   3  the engine threw something other than EngineInputError: a bug, to be reported.
//
// JSON has no Infinity: the saturation index of a solid whose ion is absent, -Infinity in the
// engine, prints as null (JSON.stringify's rule). Results are otherwise printed as solve() returns
// them; concentrations are mol/L.

import { EngineInputError, solve, type SolveResult } from '@/lib/engine';

import { InputError, isBlank, parseJsonText } from './lib/json-text';
import { describeSolveError, problemList } from './lib/problems';

const USAGE = `Usage: npm run --silent solve < problem.json
       node --import tsx scripts/solve.ts < problems.json

Reads one problem in the general form, or a JSON array of problems, from stdin and prints the
result (or an array of results) as JSON on stdout. Concentrations in mol/L.

A problem:
  {"components": ["Ag+", "CN-", "H+"],
   "totals": {"Ag+": 0.01, "CN-": 0.05}, "fixed": {"H+": 1e-12},
   "species": [{"name": "Ag(CN)2-", "logK": 20.48, "stoich": {"Ag+": 1, "CN-": 2}}],
   "solids": [{"name": "AgCN(s)", "logKsp": -15.66, "stoich": {"Ag+": 1, "CN-": 1}}]}
  optional: "activity": "ideal" | "davies", "temperatureC", "ionicStrength".

Saturation of a solid whose ion is absent (-Infinity) prints as null.
Exit codes: 0 solved (a "not_converged" status is still printed, with a note on stderr),
1 bad input (one line on stderr names the field), 2 bad command line, 3 engine bug.`;

/** Reads all of stdin as UTF-8 (decoded once at the end, so no character is split). */
async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(typeof chunk === 'string' ? Buffer.from(chunk) : (chunk as Buffer));
  return Buffer.concat(chunks).toString('utf8');
}

class Exit extends Error {
  constructor(
    readonly code: number,
    message: string,
  ) {
    super(message);
  }
}

function solveAll(problems: unknown[], isArray: boolean): SolveResult[] {
  return problems.map((problem, i) => {
    try {
      return solve(problem);
    } catch (err) {
      const line = describeSolveError(err, isArray ? i : null, problems.length);
      throw new Exit(err instanceof EngineInputError ? 1 : 3, line);
    }
  });
}

function notConvergedNote(results: SolveResult[], isArray: boolean): string | null {
  const failed = results.flatMap((r, i) => (r.status === 'converged' ? [] : [i]));
  if (failed.length === 0) return null;
  if (!isArray) return `note: the problem did not converge (status "not_converged"): ${results[0]?.message ?? ''}`;
  const which = failed.map((i) => `problems[${i}]`).join(', ');
  return `note: ${failed.length} of ${results.length} problems did not converge (status "not_converged"): ${which}`;
}

async function main(argv: string[]): Promise<void> {
  if (argv.includes('--help') || argv.includes('-h')) {
    process.stdout.write(`${USAGE}\n`);
    return;
  }
  if (argv.length > 0) throw new Exit(2, `unknown argument "${argv[0]}"; the problem comes on stdin (see --help)`);
  if (process.stdin.isTTY) throw new Exit(2, 'stdin is a terminal: pipe a problem in, e.g. npm run --silent solve < problem.json (see --help)');
  const text = await readStdin().catch((err: unknown) => {
    throw new Exit(1, `cannot read stdin: ${err instanceof Error ? err.message : String(err)}`);
  });
  if (isBlank(text)) {
    throw new Exit(1, 'stdin was empty: pipe a problem (or an array of problems) as JSON, e.g. npm run --silent solve < problem.json (see --help)');
  }
  const { problems, isArray } = problemList(parseJsonText(text));
  const results = solveAll(problems, isArray);
  const note = notConvergedNote(results, isArray);
  if (note) process.stderr.write(`${note.replace(/\s*\n\s*/g, ' ')}\n`);
  process.stdout.write(`${JSON.stringify(isArray ? results : results[0], null, 2)}\n`);
}

// NOTE: a reader that closes the pipe early (| head) is not an error of ours.
process.stdout.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code !== 'EPIPE') throw err;
});

main(process.argv.slice(2)).catch((err: unknown) => {
  const code = err instanceof Exit ? err.code : err instanceof InputError ? 1 : 3;
  const message = err instanceof Error ? err.message : String(err);
  process.stderr.write(`${message.replace(/\s*\n\s*/g, ' ')}\n`);
  process.exitCode = code;
});
