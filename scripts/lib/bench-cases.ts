// The benchmark's cases: the demo shop's baths, then every *.json problem file in a folder (a file
// holding an array gives one case per problem). Each problem is checked by compileProblem up
// front, so a bad one stops the run with one line naming the file, the problem and the field.

import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

import { DEMO_BATHS } from '@/lib/chemistry/demo-baths';
import { compileProblem, EngineInputError, type Problem } from '@/lib/engine';

import { InputError, isBlank, parseJsonText } from './json-text';
import { describeSolveError, problemList } from './problems';

/** One benchmark case: a named problem and its size. */
export interface BenchCase {
  name: string;
  problem: Problem;
  components: number;
  species: number;
  solids: number;
}

/** Thrown when the engine fails on a problem with something other than EngineInputError. */
export class EngineBugError extends Error {}

/** Compiles one problem as a case; `where` prefixes an error, `index` of `count` says which in an array. */
function toCase(name: string, problem: unknown, where: string, index: number | null = null, count = 1): BenchCase {
  try {
    const tab = compileProblem(problem);
    return { name, problem: problem as Problem, components: tab.nc, species: tab.ns, solids: tab.nsol };
  } catch (err) {
    const line = `${where}: ${describeSolveError(err, index, count)}`;
    throw err instanceof EngineInputError ? new InputError(line) : new EngineBugError(line);
  }
}

/** The demo baths, named by key. */
export function builtInCases(): BenchCase[] {
  return DEMO_BATHS.map((b) => toCase(b.key, b.problem, `built-in case ${b.key}`));
}

function readText(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (err) {
    throw new InputError(`${path}: cannot read: ${err instanceof Error ? err.message : String(err)}`);
  }
}

function casesFromFile(dir: string, file: string): BenchCase[] {
  const path = join(dir, file);
  const text = readText(path);
  if (isBlank(text)) throw new InputError(`${path}: the file is empty; give a problem or an array of problems`);
  let doc: unknown;
  try {
    doc = parseJsonText(text);
  } catch (err) {
    throw new InputError(`${path}: ${err instanceof Error ? err.message : String(err)}`);
  }
  const { problems, isArray } = problemList(doc);
  if (problems.length === 0) throw new InputError(`${path}: the array is empty; give a problem or an array of problems`);
  return problems.map((p, i) => toCase(isArray ? `${file}[${i}]` : file, p, path, isArray ? i : null, problems.length));
}

/** Every *.json file directly in dir, in name order, as cases; throws InputError on any fault. */
export function folderCases(dir: string): BenchCase[] {
  let isDir: boolean;
  try {
    isDir = statSync(dir).isDirectory();
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    throw new InputError(code === 'ENOENT' ? `folder "${dir}" does not exist` : `cannot open folder "${dir}": ${(err as Error).message}`);
  }
  if (!isDir) throw new InputError(`"${dir}" is not a folder; give a folder of *.json problem files`);
  let files: string[];
  try {
    files = readdirSync(dir).filter((f) => f.toLowerCase().endsWith('.json'));
  } catch (err) {
    throw new InputError(`cannot list folder "${dir}": ${(err as Error).message}`);
  }
  return files.sort().flatMap((f) => casesFromFile(dir, f));
}
