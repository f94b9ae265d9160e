import { dropTestDatabase } from '../support/test-db';

// Drops the run's database so repeated runs leave nothing behind.
export default async function globalTeardown(): Promise<void> {
  await dropTestDatabase(process.env.DATABASE_URL);
}
