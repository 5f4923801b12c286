// Accounts for tests: fresh ones written to the database (sign-up is e-mail confirmed and rate-limited per
// address, so its own tests drive it: tests/api/resetAndSignUpLimits.test.ts) and signed in through the real
// sign-in API; and the seeded demo guild (scripts/seed/demo-accounts.json).
import { readFileSync } from 'node:fs';
import { hash } from '@node-rs/argon2';
import type { Kysely } from 'kysely';
import type { Database, Role } from '@db/schema.ts';
import { TestClient } from './client.ts';
import { testDb } from './db.ts';

export const DEFAULT_PASSWORD = 'quilting-is-fun-42';

let counter = 0;
/** A unique address per call, e.g. "signup-1733150000000-3@guild.test". */
export function uniqueEmail(prefix = 'quilter'): string {
  counter += 1;
  return `${prefix}-${Date.now()}-${counter}-${Math.floor(Math.random() * 1e6)}@guild.test`;
}

export interface TestAccount {
  id: string;
  email: string;
  password: string;
  displayName: string;
  role: Role;
  /** Signed in as this account (the sign-up session). */
  client: TestClient;
}

// Argon2id with the app's parameters (src/server/auth/password.ts); one hash per password is enough for tests.
const hashes = new Map<string, Promise<string>>();
function passwordHash(password: string): Promise<string> {
  let h = hashes.get(password);
  if (!h) hashes.set(password, (h = hash(password.normalize('NFC'), { memoryCost: 19_456, timeCost: 2, parallelism: 1 })));
  return h;
}

/** Another app instance and its database (tests/helpers/throwawayApp.ts); the shared test server otherwise. */
export interface AccountTarget {
  appUrl: string;
  db: Kysely<Database>;
}

/** Writes a new account to the database as given, then signs it in through POST /api/session. */
export async function createAccount(
  opts: { role?: Role; email?: string; password?: string; displayName?: string; target?: AccountTarget } = {},
): Promise<TestAccount> {
  const role = opts.role ?? 'quilter';
  const email = opts.email ?? uniqueEmail(role);
  const password = opts.password ?? DEFAULT_PASSWORD;
  const displayName = opts.displayName ?? `Test ${role}`;
  const row = await (opts.target?.db ?? testDb())
    .insertInto('account')
    .values({ email, display_name: displayName, password_hash: await passwordHash(password), role, units: 'in' })
    .returning('id')
    .executeTakeFirstOrThrow();
  const client = await signIn(email, password, opts.target?.appUrl);
  return { id: row.id, email, password, displayName, role, client };
}

/** A new client signed in through POST /api/session; throws when the sign-in fails. */
export async function signIn(email: string, password: string, appUrl?: string): Promise<TestClient> {
  const client = new TestClient(appUrl);
  const res = await client.post('/api/session', { email, password });
  if (res.status !== 200) throw new Error(`tests/helpers/accounts: sign-in as ${email} failed (${res.status}): ${res.text}`);
  return client;
}

interface DemoFile {
  guild: string;
  password: string;
  accounts: { email: string; displayName: string; role: Role }[];
}
const demo = JSON.parse(readFileSync(new URL('../../scripts/seed/demo-accounts.json', import.meta.url), 'utf8')) as DemoFile;

/** The seeded demo guild: password and one account per role (first of each). */
export const demoGuild = {
  name: demo.guild,
  password: demo.password,
  accounts: demo.accounts,
  byRole(role: Role) {
    const a = demo.accounts.find((x) => x.role === role);
    if (!a) throw new Error(`tests/helpers/accounts: the demo guild has no ${role}`);
    return a;
  },
};
