import { afterAll } from 'vitest';
import { createTestDatabase } from '../support/database';

// Each test file gets its own database, so files run in parallel without seeing each other.
const database = await createTestDatabase();
process.env.DATABASE_URL = database.url;
afterAll(() => database.drop());
