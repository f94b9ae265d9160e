// npm run load [-- [--json] [--quick | --duration N]]: how the API holds up under load, measured
// against a real server on loopback. The script starts what it needs and stops it again:
// PostgreSQL (scripts/pg.sh; stopped at the end only if this run started it), a fresh database
// `ligandry_load` with the demo shop (dropped at the end), and the server as a child process
// (node --import tsx server/index.ts on 127.0.0.1, a free port, NODE_ENV=development, SEED_DEMO=0,
// request log at info level, discarded), so the load generator and the server do not share
// one event loop. It signs in once as the demo chemist and sends that session cookie with every
// request; POST requests carry an Origin equal to the server's base URL, as a browser would.
//
// Endpoints, one autocannon run each, in order, 10 connections, `--duration` seconds (30; `--quick`
// 3), each after an unmeasured warm-up of a few hundred requests:
//   POST /api/calculations, speciation of silver cyanide, offered 200 requests/s (the target:
//   p99 <= 50 ms at 200 req/s with no errors); the same system's AgCN(s) headroom at 200 req/s;
//   GET /api/runs, GET /api/baths and GET /api/constants as fast as 10 connections go.
// NOTE: autocannon's rate limit is per connection and per second: each of the 10 connections sends
// its 20 requests back to back at the start of every second, then waits. So "200 req/s offered"
// arrives as a burst of 200 requests 10 at a time each second, which is harsher than evenly spaced
// arrivals. Its coordinated-omission correction is switched off for these runs: it takes an
// expected interval of ceil(1 / rate) = 1 ms and would add made-up samples of 1, 2, 3... ms below
// every real latency. Latencies are instead taken from every response, as measured (send to
// last byte, in ms), p50 and p99 by nearest rank.
//
// Figures: req/s = 2xx responses / run seconds; errors = non-2xx answers + socket errors + timeouts
// (10 s). The human report adds the machine (CPU count and model) and the target verdict.
// --json prints exactly one JSON array on stdout: [{endpoint, rps, p50Ms, p99Ms, errors}]; progress
// always goes to stderr.
//
// Exit codes: 0 measured (over the target is reported, not an error); 1 could not measure
// (PostgreSQL, the database, the server or the sign-in did not come up, or an endpoint refused its
// first request; one line on stderr); 2 bad command line; 130 interrupted.

import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import path from 'node:path';

import { dropDatabase } from '@/db/ensure-database';
import { prepareDemoDatabase } from '@/db/prepare';
import { DEMO_PASSWORD } from '@/db/seed/team';

import { freePort } from './lib/free-port';
import { parseLoadArgs, UsageError } from './lib/load-args';

const USAGE = `Usage: npm run --silent load [-- [--json] [--quick | --duration N]]

Starts PostgreSQL (if it is not running), a fresh database ligandry_load with the demo shop and
the server on 127.0.0.1, loads five endpoints one after another with autocannon (10 connections),
prints the figures and stops everything again.
  --duration N  seconds per endpoint (default 30)
  --quick       3 s per endpoint: a smoke test, figures not meaningful
  --json        print only [{endpoint, rps, p50Ms, p99Ms, errors}] as JSON on stdout
Target: POST /api/calculations (speciation) p99 <= 50 ms at 200 req/s offered, no errors.
Exit codes: 0 measured, 1 could not start or sign in, 2 bad command line, 130 interrupted.`;

const ROOT = path.resolve(__dirname, '..');
const DB_NAME = 'ligandry_load';
const CHEMIST = 'chemist@ligandry.test';
/** Connections per run; the rated runs spread their rate over them. */
const CONNECTIONS = 10;
/** Unmeasured requests before each run, so the figures are of a warm server. */
const WARMUP_REQUESTS = 300;
/** The target: p99 latency in ms at an offered rate in requests per second, with no errors. */
const TARGET = { rate: 200, p99Ms: 50 } as const;
/** How long the server gets to answer GET /api/health after it was started, ms. */
const START_TIMEOUT_MS = 60_000;

/** A bright silver cyanide bath (mol/L), as the calculators take a system. */
const SILVER_CYANIDE = {
  metals: ['Ag+'],
  ligands: ['CN-'],
  counterIons: ['K+'],
  totals: { 'Ag+': 0.3, 'CN-': 1.0, 'K+': 1.0 },
  pH: 12,
  activity: 'davies',
};

interface Endpoint {
  label: string;
  method: 'GET' | 'POST';
  path: string;
  body?: unknown;
  /** Offered requests per second, or null for as fast as the connections go. */
  rate: number | null;
}

const ENDPOINTS: Endpoint[] = [
  { label: 'POST /api/calculations (speciation)', method: 'POST', path: '/api/calculations', body: { calculator: 'speciation', system: SILVER_CYANIDE, params: {} }, rate: TARGET.rate },
  { label: 'POST /api/calculations (headroom)', method: 'POST', path: '/api/calculations', body: { calculator: 'headroom', system: SILVER_CYANIDE, params: { solid: 'AgCN(s)' } }, rate: TARGET.rate },
  { label: 'GET /api/runs', method: 'GET', path: '/api/runs', rate: null },
  { label: 'GET /api/baths', method: 'GET', path: '/api/baths', rate: null },
  { label: 'GET /api/constants', method: 'GET', path: '/api/constants', rate: null },
];

/** One endpoint's figures, as --json prints them (ms rounded to 0.1, req/s to 0.1). */
interface Figures {
  endpoint: string;
  rps: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
}

// The part of autocannon (no type declarations ship with it) this script uses.
interface CannonOptions {
  url: string;
  method: 'GET' | 'POST';
  headers: Record<string, string>;
  body?: string;
  connections: number;
  duration?: number;
  amount?: number;
  overallRate?: number;
  ignoreCoordinatedOmission?: boolean;
}
interface CannonResult {
  /** Seconds the run took. */
  duration: number;
  /** Socket errors and timeouts together. */
  errors: number;
  non2xx: number;
  '2xx': number;
}
interface CannonRun extends PromiseLike<CannonResult> {
  on(event: 'response', listener: (client: unknown, status: number, bytes: number, ms: number) => void): this;
  stop(): void;
}
// NOTE: require, not import: autocannon ships no types, and the shape above is all we rely on.
const autocannon = require('autocannon') as (options: CannonOptions) => CannonRun;

/** Something that stopped the run before it measured; the message is the one line for stderr. */
class SetupError extends Error {}

/** What this run started, stopped in reverse order at the end, on an error or on Ctrl-C. */
const cleanups: (() => Promise<void> | void)[] = [];
let activeRun: CannonRun | null = null;
/** Set on SIGINT or SIGTERM: the signal handler cleans up and exits; main stops quietly. */
let interrupted = false;

async function cleanUp(): Promise<void> {
  activeRun?.stop();
  for (const step of cleanups.splice(0).reverse()) {
    try {
      await step();
    } catch (err) {
      progress(`clean-up step failed: ${(err as Error).message}`);
    }
  }
}

function progress(line: string): void {
  process.stderr.write(`load: ${line}\n`);
}

/** The last non-empty line of a program's output. */
function lastLine(text: string): string {
  return text.split('\n').map((l) => l.trim()).filter(Boolean).pop() ?? '';
}

/** Runs scripts/pg.sh with `args`; its own status lines go to stderr, never to stdout. */
function pgScript(...args: string[]): { ok: boolean; out: string; err: string } {
  const run = spawnSync('bash', [path.join(ROOT, 'scripts/pg.sh'), ...args], { cwd: ROOT, encoding: 'utf8' });
  return { ok: run.status === 0, out: run.stdout ?? '', err: `${run.stderr ?? ''}${run.error ? run.error.message : ''}` };
}

/** Starts PostgreSQL unless it runs already (then it is left running) and returns the load database's URL. */
function startPostgres(): string {
  if (!pgScript('running').ok) {
    const started = pgScript('start');
    if (!started.ok) throw new SetupError(`PostgreSQL could not start: ${(lastLine(started.err) || lastLine(started.out) || 'scripts/pg.sh start failed').replace(/^PostgreSQL: /, '')}`);
    progress(lastLine(started.out));
    cleanups.push(() => {
      pgScript('stop');
      progress('PostgreSQL stopped again');
    });
  }
  const url = pgScript('url', DB_NAME);
  if (!url.ok) throw new SetupError(`no PostgreSQL URL: ${lastLine(url.err)}`);
  return url.out.trim();
}

/** A fresh load database with migrations, the starting library and the demo shop (demo team included). */
async function prepareLoadDatabase(url: string, uploadsDir: string): Promise<void> {
  try {
    await dropDatabase(url);
    cleanups.push(() => dropDatabase(url));
    const prepared = await prepareDemoDatabase(url, uploadsDir);
    if (prepared.seed?.production) throw new Error('NODE_ENV=production never seeds the demo accounts the load signs in with; run without it');
  } catch (err) {
    throw new SetupError(`the database ${DB_NAME} could not be prepared: ${lastLine((err as Error).message)}`);
  }
  progress(`database ${DB_NAME} prepared with the demo shop`);
}

/** Starts server/index.ts in its own process; the returned text holds the end of its stderr. */
function startServer(port: number, databaseUrl: string, uploadsDir: string, webDir: string): { child: ChildProcess; stderr: { text: string } } {
  // A signal during the set-up has already run the clean-up: a server started now would be left behind.
  if (interrupted) throw new SetupError('interrupted');
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'development',
    SEED_DEMO: '0',
    HOST: '127.0.0.1',
    PORT: String(port),
    DATABASE_URL: databaseUrl,
    UPLOADS_DIR: uploadsDir,
    WEB_DIR: webDir,
    LOCAL_SMTP_PORT: '0',
    LOG_LEVEL: 'info',
  };
  delete env.SMTP_URL;
  delete env.PUBLIC_URL;
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { cwd: ROOT, env, stdio: ['ignore', 'ignore', 'pipe'] });
  const stderr = { text: '' };
  child.stderr?.setEncoding('utf8');
  child.stderr?.on('data', (chunk: string) => {
    stderr.text = (stderr.text + chunk).slice(-4000);
  });
  cleanups.push(() => stopServer(child));
  return { child, stderr };
}

/** SIGTERM (the server's own graceful shutdown), then SIGKILL if it is still there after 15 s. */
async function stopServer(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), 15_000);
  await exited;
  clearTimeout(timer);
  progress('server stopped');
}

/** Polls GET /api/health until it answers 200; fails when the server exits or takes too long. */
async function waitForHealth(base: string, child: ChildProcess, stderr: { text: string }): Promise<void> {
  const deadline = Date.now() + START_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if (child.exitCode !== null || child.signalCode !== null) {
      throw new SetupError(`the server stopped while starting: ${lastLine(stderr.text) || `exit ${child.exitCode ?? child.signalCode}`}`);
    }
    try {
      const res = await fetch(`${base}/api/health`, { signal: AbortSignal.timeout(2000) });
      if (res.status === 200) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new SetupError(`the server did not answer GET /api/health with 200 within ${START_TIMEOUT_MS / 1000} s`);
}

/** Signs in as the demo chemist and returns the session cookie ("name=value"). */
async function signIn(base: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: CHEMIST, password: DEMO_PASSWORD }),
  });
  const cookie = res.headers.getSetCookie().map((c) => c.split(';')[0] ?? '').find((c) => c.startsWith('ligandry_session='));
  if (!res.ok || !cookie) throw new SetupError(`signing in as ${CHEMIST} failed: ${res.status} ${await errorText(res)}`);
  return cookie;
}

async function errorText(res: Response): Promise<string> {
  const text = await res.text();
  try {
    return (JSON.parse(text) as { error?: { message?: string } }).error?.message ?? text.slice(0, 200);
  } catch {
    return text.slice(0, 200);
  }
}

function requestOf(base: string, endpoint: Endpoint, cookie: string): Pick<CannonOptions, 'url' | 'method' | 'headers' | 'body'> {
  const headers: Record<string, string> = { cookie };
  if (endpoint.method === 'GET') return { url: base + endpoint.path, method: 'GET', headers };
  return { url: base + endpoint.path, method: 'POST', headers: { ...headers, origin: base, 'content-type': 'application/json' }, body: JSON.stringify(endpoint.body) };
}

/** One request before the run: an endpoint that refuses it would only measure its error answer. */
async function preflight(request: ReturnType<typeof requestOf>, label: string): Promise<void> {
  const res = await fetch(request.url, { method: request.method, headers: request.headers, body: request.body });
  if (!res.ok) throw new SetupError(`${label} answered ${res.status} before the run: ${await errorText(res)}`);
  await res.arrayBuffer();
}

async function cannon(options: CannonOptions, onLatency?: (ms: number) => void): Promise<CannonResult> {
  const run = autocannon(options);
  activeRun = run;
  if (onLatency) run.on('response', (_client, _status, _bytes, ms) => onLatency(ms));
  try {
    return await run;
  } finally {
    activeRun = null;
  }
}

/** The value at quantile q of sorted values, by nearest rank. */
function nearestRank(sorted: Float64Array, q: number): number {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))] as number;
}

const tenth = (v: number) => Math.round(v * 10) / 10;

/** Warms the endpoint up, then loads it for `durationS` seconds and returns its figures. */
async function measure(base: string, endpoint: Endpoint, cookie: string, durationS: number): Promise<Figures> {
  const request = requestOf(base, endpoint, cookie);
  await preflight(request, endpoint.label);
  await cannon({ ...request, connections: CONNECTIONS, amount: WARMUP_REQUESTS });
  const rated = endpoint.rate === null ? {} : { overallRate: endpoint.rate, ignoreCoordinatedOmission: true };
  const latencies: number[] = [];
  const result = await cannon({ ...request, connections: CONNECTIONS, duration: durationS, ...rated }, (ms) => latencies.push(ms));
  const sorted = Float64Array.from(latencies).sort();
  return {
    endpoint: endpoint.label,
    rps: tenth(result['2xx'] / result.duration),
    p50Ms: tenth(nearestRank(sorted, 0.5)),
    p99Ms: tenth(nearestRank(sorted, 0.99)),
    errors: result.non2xx + result.errors,
  };
}

function machine(): string {
  const list = cpus();
  return `${list.length} CPUs, ${list[0]?.model.trim() ?? 'unknown model'}; node ${process.version}, ${process.platform}/${process.arch}`;
}

/** The target's verdict for one rated run: p99 against the limit, and no errors at the full rate. */
function verdict(f: Figures, rate: number): string {
  const head = `p99 ${f.p99Ms.toFixed(1)} ms at ${rate} req/s`;
  const shortfalls = [f.errors > 0 ? `${f.errors} errors` : '', f.rps < rate * 0.95 ? `only ${f.rps.toFixed(1)} req/s achieved` : ''].filter(Boolean);
  const where = f.p99Ms <= TARGET.p99Ms ? 'within' : 'over';
  return shortfalls.length === 0 ? `${head}: ${where} the ${TARGET.p99Ms} ms target` : `${head}: target NOT met (${shortfalls.join(', ')}; p99 ${where} ${TARGET.p99Ms} ms)`;
}

function report(figures: Figures[], durationS: number, quick: boolean): string {
  const row = ([name = '', ...cells]: string[]) => name.padEnd(38) + cells.map((c, i) => c.padStart(i === 0 ? 12 : 9)).join('');
  const lines = [
    `Ligandry API under load: ${durationS} s per endpoint after ${WARMUP_REQUESTS} warm-up requests, ${CONNECTIONS} connections, ` +
      `the server in its own process on 127.0.0.1${quick ? '; QUICK: a smoke test, figures not meaningful' : ''}`,
    `machine: ${machine()}`,
    '',
    row(['endpoint', 'offered', 'req/s', 'p50 ms', 'p99 ms', 'errors']),
    ...figures.map((f, i) => {
      const rate = ENDPOINTS[i]?.rate ?? null;
      return row([f.endpoint, rate === null ? 'unthrottled' : `${rate}/s`, f.rps.toFixed(1), f.p50Ms.toFixed(1), f.p99Ms.toFixed(1), String(f.errors)]);
    }),
    '',
    `offered ${TARGET.rate}/s: each second's requests leave in one burst over the ${CONNECTIONS} connections (autocannon's rate limit)`,
    `errors: non-2xx answers + socket errors + timeouts (10 s)`,
    '',
    ...figures.flatMap((f, i) => {
      const rate = ENDPOINTS[i]?.rate ?? null;
      return rate === null ? [] : [`target, ${f.endpoint}: ${verdict(f, rate)}`];
    }),
  ];
  return `${lines.join('\n')}\n`;
}

async function main(argv: string[]): Promise<void> {
  const options = parseLoadArgs(argv);
  if (options.help) {
    process.stdout.write(`${USAGE}\n`);
    return;
  }
  const scratch = mkdtempSync(path.join(tmpdir(), 'ligandry-load-'));
  cleanups.push(() => rmSync(scratch, { recursive: true, force: true }));
  const uploadsDir = path.join(scratch, 'uploads');
  const webDir = mkdtempSync(path.join(scratch, 'web-'));
  const url = startPostgres();
  await prepareLoadDatabase(url, uploadsDir);
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const { child, stderr } = startServer(port, url, uploadsDir, webDir);
  await waitForHealth(base, child, stderr);
  progress(`server up at ${base} (pid ${child.pid})`);
  const cookie = await signIn(base);
  const figures: Figures[] = [];
  for (const endpoint of ENDPOINTS) {
    progress(`${endpoint.label}: ${options.durationS} s, ${endpoint.rate === null ? 'unthrottled' : `${endpoint.rate} req/s offered`}`);
    figures.push(await measure(base, endpoint, cookie, options.durationS));
    if (interrupted) return;
    if (child.exitCode !== null || child.signalCode !== null) throw new SetupError(`the server stopped during the run: ${lastLine(stderr.text) || `exit ${child.exitCode ?? child.signalCode}`}`);
  }
  await cleanUp();
  if (options.json) process.stderr.write(`machine: ${machine()}\n`);
  process.stdout.write(options.json ? `${JSON.stringify(figures)}\n` : report(figures, options.durationS, options.quick));
}

function onSignal(signal: NodeJS.Signals): void {
  interrupted = true;
  progress(`${signal}: stopping`);
  void cleanUp().finally(() => process.exit(130));
}
process.once('SIGINT', onSignal);
process.once('SIGTERM', onSignal);

main(process.argv.slice(2)).then(
  () => {
    if (!interrupted) process.exitCode = 0;
  },
  async (err: unknown) => {
    if (interrupted) return;
    await cleanUp();
    const code = err instanceof UsageError ? 2 : 1;
    const text = err instanceof Error ? err.message : String(err);
    const message = err instanceof UsageError || err instanceof SetupError ? text : `internal error: ${text}`;
    process.stderr.write(`load: ${message.replace(/\s*\n\s*/g, ' ')}\n`);
    process.exitCode = code;
  },
);
