import { sql, type Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
// A quilt is a quilt map (rows × columns of placed designs, sashing, borders; shared/quilt/quilt.schema.ts checks
// `data` before it is written and after it is read) owned by one account, like a design. `version` counts saves
// (optimistic concurrency: a save names the version it was based on); deleted_at is a soft delete.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('quilt')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('owner_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('title', 'text', (c) => c.notNull().check(sql`char_length(title) between 1 and 200`))
    .addColumn('data', 'jsonb', (c) => c.notNull().check(sql`jsonb_typeof(data) = 'object'`))
    .addColumn('version', 'integer', (c) => c.notNull().defaultTo(1).check(sql`version >= 1`))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('deleted_at', 'timestamptz')
    .execute();
  await sql`create index quilt_owner_updated_idx on quilt (owner_id, updated_at desc) where deleted_at is null`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('quilt').execute();
}
