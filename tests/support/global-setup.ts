import { createTestDb, testDbSettings } from './test-db';

export default async function globalSetup(): Promise<void> {
  const db = createTestDb();
  try {
    await db.migrate.latest();
  } catch (err) {
    const s = testDbSettings();
    throw new Error(
      `API tests need the test MariaDB at ${s.host}:${s.port}/${s.database} (npm test starts it): ${err instanceof Error ? err.message : err}`,
      { cause: err },
    );
  } finally {
    await db.destroy();
  }
}
