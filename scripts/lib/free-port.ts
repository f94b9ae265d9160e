// A loopback port for a server started by a script or a test (the load run, the browser tests,
// a throwaway PostgreSQL).
import { createServer } from 'node:net';

/** A port on 127.0.0.1 that nothing listens on right now. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}
