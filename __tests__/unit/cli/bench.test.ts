// The benchmark (scripts/bench.ts) in its quick mode: the shape of its JSON, never its timings.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { DEMO_BATHS } from '@/lib/chemistry/demo-baths';

import { ROOT, runScript, stderrLines } from './run-script';

const bench = (args: string[]) => runScript('scripts/bench.ts', args, '', ['--expose-gc']);

// A small problem: silver(I) with ammonia at a fixed pH; constants as in reference-constants.ts.
const SMALL = {
  components: ['Ag+', 'NH3', 'H+'],
  totals: { 'Ag+': 0.001, NH3: 0.1 },
  fixed: { 'H+': 1e-10 },
  species: [
    { name: 'Ag(NH3)2+', logK: 7.22, stoich: { 'Ag+': 1, NH3: 2 } },
    { name: 'NH4+', logK: 9.25, stoich: { 'H+': 1, NH3: 1 } },
  ],
};

describe('npm run bench', () => {
  let dir: string;
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'ligandry-bench-'));
    writeFileSync(join(dir, 'small.json'), JSON.stringify(SMALL));
    writeFileSync(join(dir, 'notes.txt'), 'not a problem: only *.json files are cases');
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('--json prints one object with finite figures; cases are the demo baths plus the folder', () => {
    const run = bench([dir, '--json', '--quick']);
    expect(run.status).toBe(0);
    // stderr holds notes only (a case or curve point the engine did not converge on), never errors.
    for (const line of stderrLines(run)) expect(line).toMatch(/^note: /);
    expect(run.stdout.trim().split('\n')).toHaveLength(1);
    const out = JSON.parse(run.stdout);
    expect(Object.keys(out).sort()).toEqual(['cases', 'curve500Ms', 'maxUs', 'medianUs', 'p99Us', 'solvesPerSecond']);
    for (const value of Object.values(out)) expect(Number.isFinite(value)).toBe(true);
    expect(out.cases).toBe(DEMO_BATHS.length + 1);
  });

  it('npm run bench bundles the same script and passes its arguments and exit code through', () => {
    const out = spawnSync(process.execPath, ['scripts/bench-run.mjs', dir, '--json', '--quick'], { cwd: ROOT, encoding: 'utf8', timeout: 60_000 });
    expect(out.status).toBe(0);
    expect(Object.keys(JSON.parse(out.stdout)).sort()).toEqual(['cases', 'curve500Ms', 'maxUs', 'medianUs', 'p99Us', 'solvesPerSecond']);
    const bad = spawnSync(process.execPath, ['scripts/bench-run.mjs', join(dir, 'missing')], { cwd: ROOT, encoding: 'utf8', timeout: 60_000 });
    expect(bad.status).toBe(1);
    expect(bad.stderr).toMatch(/missing" does not exist/);
  });

  it.each([
    ['a folder that does not exist', (d: string) => [join(d, 'missing')], /^folder ".*missing" does not exist$/],
    ['a file that is not JSON', (d: string) => [writeBad(d, 'broken.json', '{"components": [')], /broken\.json: invalid JSON at line 1 column 17: /],
  ])('stops on %s: non-zero exit, one line on stderr', (_name, args, line) => {
    const run = bench(['--json', '--quick', ...args(dir)]);
    expect(run.status).toBe(1);
    expect(run.stdout).toBe('');
    expect(stderrLines(run)).toEqual([expect.stringMatching(line)]);
  });
});

/** Writes a bad file into a folder of its own and returns the folder. */
function writeBad(parent: string, name: string, text: string): string {
  const folder = mkdtempSync(join(parent, 'bad-'));
  writeFileSync(join(folder, name), text);
  return folder;
}
