import { sql, type Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
// A design is one block's drawing owned by one account. `version` counts saves (optimistic concurrency);
// every save also lands in design_version so a quilter can go back. design_route holds at most one saved
// route per design, with the design version it was computed for.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('design')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('owner_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('title', 'text', (c) => c.notNull().check(sql`char_length(title) between 1 and 200`))
    .addColumn('notes', 'text', (c) => c.notNull().defaultTo('').check(sql`char_length(notes) <= 10000`))
    .addColumn('data', 'jsonb', (c) => c.notNull())
    .addColumn('thumbnail_svg', 'text', (c) => c.notNull())
    .addColumn('version', 'integer', (c) => c.notNull().defaultTo(1).check(sql`version >= 1`))
    // Figures of the planned route for the current version (passes, stops, travel, thread…); null when
    // the planner could not finish (time cap) or refused the design.
    .addColumn('summary', 'jsonb')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('deleted_at', 'timestamptz')
    .execute();
  await sql`create index design_owner_updated_idx on design (owner_id, updated_at desc) where deleted_at is null`.execute(db);

  await db.schema
    .createTable('design_version')
    .addColumn('design_id', 'uuid', (c) => c.notNull().references('design.id').onDelete('cascade'))
    .addColumn('version', 'integer', (c) => c.notNull())
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('notes', 'text', (c) => c.notNull())
    .addColumn('data', 'jsonb', (c) => c.notNull())
    .addColumn('saved_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint('design_version_pkey', ['design_id', 'version'])
    .execute();

  await db.schema
    .createTable('design_route')
    .addColumn('design_id', 'uuid', (c) => c.primaryKey().references('design.id').onDelete('cascade'))
    .addColumn('kind', 'text', (c) => c.notNull().check(sql`kind in ('planned', 'own')`))
    .addColumn('strokes', 'jsonb', (c) => c.notNull())
    .addColumn('summary', 'jsonb', (c) => c.notNull())
    .addColumn('design_version', 'integer', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of ['design_route', 'design_version', 'design']) {
    await db.schema.dropTable(table).execute();
  }
}
