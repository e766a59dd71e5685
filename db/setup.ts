// Migrates the database named by the DB_* env vars and, with --demo, loads the demo catalogue.
import { createDb } from './connection';
import { seedDemo } from './demo/seed';

async function main(): Promise<void> {
  const db = createDb();
  try {
    const [, applied] = await db.migrate.latest();
    if (applied.length > 0) console.log(`[conestack] migrations applied: ${applied.join(', ')}`);
    if (process.argv.includes('--demo')) {
      const { drivers, added } = await seedDemo(db, { reset: process.argv.includes('--reset-demo') });
      console.log(`[conestack] demo catalogue: ${drivers} drivers (${added} added)`);
    }
  } finally {
    await db.destroy();
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
