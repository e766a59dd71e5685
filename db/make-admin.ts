// `npm run make-admin -- <login>`: gives an existing account the admin role, with an audit entry.
import { createDb } from './connection';
import { createUsersRepository } from '../server/auth/repository';
import { createUsersService } from '../server/auth/service';

async function main(): Promise<void> {
  const login = process.argv[2];
  if (!login) {
    console.error('usage: npm run make-admin -- <login>   (the account must have signed in once)');
    process.exit(2);
  }
  const db = createDb();
  try {
    const user = await createUsersService(createUsersRepository(db)).promote(login);
    console.log(`[conestack] ${user.login} is now ${user.role}`);
  } finally {
    await db.destroy();
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
