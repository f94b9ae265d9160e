// The JSON command line (scripts/solve.ts), run as a child process the way npm runs it.
import { runScript, stderrLines } from './run-script';

const solveCli = (input: string, args: string[] = []) => runScript('scripts/solve.ts', args, input);

// Silver(I) cyanide with one solid; log K and log Ksp as in lib/chemistry/reference-constants.ts.
const SILVER = {
  components: ['Ag+', 'CN-', 'H+'],
  totals: { 'Ag+': 0.01, 'CN-': 0.05 },
  fixed: { 'H+': 1e-12 },
  species: [
    { name: 'Ag(CN)2-', logK: 20.48, stoich: { 'Ag+': 1, 'CN-': 2 } },
    { name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } },
  ],
  solids: [{ name: 'AgCN(s)', logKsp: -15.66, stoich: { 'Ag+': 1, 'CN-': 1 } }],
};

// No silver at all: the saturation index of AgCl(s) is -Infinity in the engine, null in JSON.
const NO_SILVER = {
  components: ['Ag+', 'Cl-'],
  totals: { 'Ag+': 0, 'Cl-': 0.1 },
  solids: [{ name: 'AgCl(s)', logKsp: -9.75, stoich: { 'Ag+': 1, 'Cl-': 1 } }],
};

// Cyanide just short of Ag(CN)2- with a little chloride: a problem that engine versions under
// development have come back "not_converged" on. Either way the command line prints the result
// and exits 0, with a note on stderr only when a result did not converge.
const HARD = {
  components: ['Ag+', 'CN-', 'Cl-'],
  totals: { 'Ag+': 0.1, 'CN-': 0.199, 'Cl-': 0.001 },
  species: [
    { name: 'Ag(CN)2-', logK: 20.48, stoich: { 'Ag+': 1, 'CN-': 2 } },
    { name: 'AgCl', logK: 3.04, stoich: { 'Ag+': 1, 'Cl-': 1 } },
  ],
};

describe('npm run solve', () => {
  it('prints the result of one problem as one JSON document and exits 0', () => {
    const run = solveCli(JSON.stringify(SILVER));
    expect([run.status, run.stderr]).toEqual([0, '']);
    expect(run.stdout.endsWith('}\n')).toBe(true);
    const result = JSON.parse(run.stdout);
    for (const key of ['free', 'species', 'solids', 'saturation', 'ionicStrength', 'iterations', 'residual']) {
      expect(result).toHaveProperty(key);
    }
    expect(result.status).toBe('converged');
    // Mass balance of silver: free Ag+ plus Ag(CN)2- (no solid at this cyanide excess).
    expect(result.solids).toEqual({});
    expect(result.species['Ag+'] + result.species['Ag(CN)2-']).toBeCloseTo(0.01, 12);
  });

  it('answers an array with an array, prints -Infinity as null and notes a non-converged result', () => {
    const run = solveCli(JSON.stringify([SILVER, NO_SILVER, HARD]));
    expect(run.status).toBe(0);
    const results = JSON.parse(run.stdout);
    expect(Array.isArray(results)).toBe(true);
    expect(results).toHaveLength(3);
    expect(results[1].saturation['AgCl(s)']).toBeNull();
    const failed = results.flatMap((r: { status: string }, i: number) => (r.status === 'converged' ? [] : [`problems[${i}]`]));
    const expected = failed.length === 0 ? [] : [`note: ${failed.length} of 3 problems did not converge (status "not_converged"): ${failed.join(', ')}`];
    expect(stderrLines(run)).toEqual(expected);
  });

  it.each([
    ['invalid JSON, with line and column', '{\n  "components": ["Ag+",]\n}', /^invalid JSON at line 2 column 24: trailing comma/],
    ['empty stdin', ' \n', /^stdin was empty: .*npm run --silent solve < problem\.json/],
    [
      'an unknown component in a stoichiometry',
      JSON.stringify({ ...SILVER, species: [{ name: 'AgX', logK: 3, stoich: { 'Ag+': 1, X: 1 } }] }),
      /^species\[0\]\.stoich\.X: unknown component "X"/,
    ],
    [
      'a negative total, in the second problem of an array',
      JSON.stringify([SILVER, { ...SILVER, totals: { 'Ag+': 0.01, 'CN-': -0.05 } }]),
      /^problems\[1\] \(problem 2 of 2\): totals\.CN-: a total cannot be negative/,
    ],
  ])('refuses %s: exit 1, nothing on stdout, one line on stderr', (_name, input, line) => {
    const run = solveCli(input);
    expect(run.status).toBe(1);
    expect(run.stdout).toBe('');
    const lines = stderrLines(run);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(line);
  });
});
