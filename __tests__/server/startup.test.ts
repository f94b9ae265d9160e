import { spawn } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../..');

type Outcome = { code: number | null; output: string };

// Runs server/index.ts as `npm start` would, with `env` on top; `whenUp` runs once it listens.
function runServer(env: Record<string, string>, whenUp?: (port: string, kill: () => void) => void): Promise<Outcome> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      cwd: ROOT,
      env: { ...process.env, LOG_LEVEL: 'silent', ...env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    const collect = (d: Buffer) => {
      output += d.toString();
      const up = output.match(/running at http:\/\/127\.0\.0\.1:(\d+)/);
      if (up && whenUp) {
        whenUp(up[1]!, () => child.kill('SIGTERM'));
        whenUp = undefined;
      }
    };
    child.stdout.on('data', collect);
    child.stderr.on('data', collect);
    child.on('exit', (code) => resolve({ code, output }));
  });
}

describe('server start-up and shutdown', () => {
  it('names each bad setting and stops', async () => {
    const { code, output } = await runServer({ PORT: 'eighty', DATABASE_URL: 'mysql://nope' });
    expect(code).toBe(1);
    expect(output).toMatch(/Configuration error/);
    expect(output).toMatch(/PORT: must be a whole number/);
    expect(output).toMatch(/DATABASE_URL: must start with postgres/);
  });

  it('says where to look when PostgreSQL cannot be reached', async () => {
    const { code, output } = await runServer({ PORT: '0', DATABASE_URL: 'postgres://a:b@127.0.0.1:1/none' });
    expect(code).toBe(1);
    expect(output).toMatch(/Cannot reach PostgreSQL at 127\.0\.0\.1:1: ECONNREFUSED/);
    expect(output).toMatch(/\.data\/pg-log\/postgres\.log/);
  });

  it('says the port is taken instead of crashing', async () => {
    const blocker = net.createServer().listen(0, '127.0.0.1');
    await new Promise((r) => blocker.once('listening', r));
    const port = String((blocker.address() as net.AddressInfo).port);
    const { code, output } = await runServer({ PORT: port, DATABASE_URL: process.env.DATABASE_URL as string });
    blocker.close();
    expect(code).toBe(1);
    expect(output).toContain(`Port ${port} on 127.0.0.1 is taken by another program`);
  });

  it('serves health, then exits cleanly on SIGTERM', async () => {
    let health: unknown;
    const { code } = await runServer({ PORT: '0', DATABASE_URL: process.env.DATABASE_URL as string }, (port, kill) => {
      fetch(`http://127.0.0.1:${port}/api/health`)
        .then((res) => res.json())
        .then((body) => (health = body))
        .finally(kill);
    });
    expect(health).toMatchObject({ status: 'ok', db: 'up' });
    expect(code).toBe(0);
  });
});
