// npm run bench: bundles scripts/bench.ts and the engine into one module with esbuild, as the
// engine ships to the browser, then runs it with --expose-gc (arguments passed through). Timing
// the bundle leaves out the per-call cost of tsx's module wrappers, which production code
// does not pay. The bundle goes to node_modules/.cache/ligandry-bench/.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

import { build } from 'esbuild';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const outfile = join(root, 'node_modules/.cache/ligandry-bench/bench.mjs');
mkdirSync(dirname(outfile), { recursive: true });
try {
  await build({
    entryPoints: [join(root, 'scripts/bench.ts')],
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    outfile,
    logLevel: 'error',
    absWorkingDir: root,
  });
} catch (err) {
  process.stderr.write(`bench: could not bundle scripts/bench.ts: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exit(3);
}
const run = spawnSync(process.execPath, ['--expose-gc', outfile, ...process.argv.slice(2)], { stdio: 'inherit' });
process.exit(run.status ?? 1);
