// Queries on `account` only. Rows become camelCase domain objects here; rules live in account.service.ts.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { AccountRow, Database, Role, UnitsPreference } from '@db/schema.ts';

export interface Account {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  units: UnitsPreference;
  createdAt: Date;
  updatedAt: Date;
}

type Db = Kysely<Database> | Transaction<Database>;

export function rowToAccount(row: AccountRow): Account {
  return {
    id: row.id,
    email: row.email,
    displayName: row.display_name,
    role: row.role,
    units: row.units,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

/** E-mail matches ignore case, as the unique index on lower(email) does. */
export async function findAccountRowByEmail(db: Db, email: string): Promise<AccountRow | undefined> {
  return db.selectFrom('account').selectAll().where(sql<string>`lower(email)`, '=', email.toLowerCase()).executeTakeFirst();
}

export async function findAccountRowById(db: Db, id: string): Promise<AccountRow | undefined> {
  return db.selectFrom('account').selectAll().where('id', '=', id).executeTakeFirst();
}

/** Inserts an account; undefined when the e-mail is already taken (any case). */
export async function insertAccount(
  db: Db,
  values: { email: string; displayName: string; passwordHash: string; units: UnitsPreference; role?: Role },
): Promise<AccountRow | undefined> {
  return db
    .insertInto('account')
    .values({ email: values.email, display_name: values.displayName, password_hash: values.passwordHash, units: values.units, ...(values.role && { role: values.role }) })
    .onConflict((oc) => oc.expression(sql`lower(email)`).doNothing())
    .returningAll()
    .executeTakeFirst();
}

export async function updateAccount(
  db: Db,
  id: string,
  changes: Partial<{ email: string; displayName: string; passwordHash: string; units: UnitsPreference; role: Role }>,
): Promise<AccountRow | undefined> {
  return db
    .updateTable('account')
    .set({
      ...(changes.email !== undefined && { email: changes.email }),
      ...(changes.displayName !== undefined && { display_name: changes.displayName }),
      ...(changes.passwordHash !== undefined && { password_hash: changes.passwordHash }),
      ...(changes.units !== undefined && { units: changes.units }),
      ...(changes.role !== undefined && { role: changes.role }),
      updated_at: new Date(),
    })
    .where('id', '=', id)
    .returningAll()
    .executeTakeFirst();
}

export async function setAccountPasswordHash(db: Db, id: string, passwordHash: string, now: Date): Promise<void> {
  await db.updateTable('account').set({ password_hash: passwordHash, updated_at: now }).where('id', '=', id).execute();
}

/** Locks every admin row (FOR UPDATE) so two demotions cannot both see "another admin remains". */
export async function lockAdminIds(trx: Transaction<Database>): Promise<string[]> {
  const rows = await trx.selectFrom('account').select('id').where('role', '=', 'admin').orderBy('id').forUpdate().execute();
  return rows.map((r) => r.id);
}

export interface AccountPage {
  accounts: Account[];
  total: number;
  page: number;
  pageSize: number;
}

/** Accounts whose e-mail or display name contains `q` (case-insensitive), newest first. */
export async function searchAccounts(db: Db, q: string, page: number, pageSize: number): Promise<AccountPage> {
  let base = db.selectFrom('account');
  if (q) {
    const pattern = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    base = base.where((eb) => eb.or([eb('email', 'ilike', pattern), eb('display_name', 'ilike', pattern)]));
  }
  const [rows, count] = await Promise.all([
    base.selectAll().orderBy('created_at', 'desc').orderBy('id').limit(pageSize).offset((page - 1) * pageSize).execute(),
    base.select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow(),
  ]);
  return { accounts: rows.map(rowToAccount), total: Number(count.n), page, pageSize };
}
