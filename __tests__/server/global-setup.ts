import { createTestDatabase } from '../support/test-db';

// Jest runs this once before the server project; workers inherit DATABASE_URL.
export default async function globalSetup(): Promise<void> {
  process.env.DATABASE_URL = await createTestDatabase('ligandry_test');
}
