// The one way services open a transaction. A service decides which writes must land together (a rule); the
// repositories it calls inside run the queries on the transaction they are handed.
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

/** Runs `work` in one transaction: committed when it resolves, rolled back when it throws. */
export function inTransaction<T>(db: Kysely<Database>, work: (trx: Transaction<Database>) => Promise<T>): Promise<T> {
  return db.transaction().execute(work);
}
