import { sql, type Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
// Two tables for planning whole quilts in worker processes (the queue itself is pg-boss's own schema):
// - corner_cost: a design's 16 corner-pair plans in the design's own corners and units (shared/quilt/cornerCosts.ts
//   designCornerCostsSchema checks `pairs` on the way out), one row per design, design version and planner settings
//   (`settings_key`). The eight placed orientations are relabelled from this one table, never stored.
// - quilt_plan_job: one whole-quilt plan of one quilt version over given design versions (`inputs_key`): its state,
//   progress (corner-pair plans done / total, written by the worker so any app instance can answer) and result.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('corner_cost')
    .addColumn('design_id', 'uuid', (c) => c.notNull().references('design.id').onDelete('cascade'))
    .addColumn('design_version', 'integer', (c) => c.notNull().check(sql`design_version >= 1`))
    .addColumn('settings_key', 'text', (c) => c.notNull().check(sql`char_length(settings_key) between 1 and 200`))
    .addColumn('pairs', 'jsonb', (c) => c.notNull().check(sql`jsonb_typeof(pairs) = 'object'`))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint('corner_cost_pkey', ['design_id', 'design_version', 'settings_key'])
    .execute();
  await db.schema
    .createTable('quilt_plan_job')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('quilt_id', 'uuid', (c) => c.notNull().references('quilt.id').onDelete('cascade'))
    .addColumn('owner_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('quilt_version', 'integer', (c) => c.notNull().check(sql`quilt_version >= 1`))
    .addColumn('inputs_key', 'text', (c) => c.notNull().check(sql`char_length(inputs_key) between 1 and 200`))
    .addColumn('state', 'text', (c) => c.notNull().defaultTo('queued').check(sql`state in ('queued', 'running', 'done', 'failed')`))
    .addColumn('done', 'integer', (c) => c.notNull().defaultTo(0).check(sql`done >= 0`))
    .addColumn('total', 'integer', (c) => c.notNull().defaultTo(0).check(sql`total >= 0`))
    .addColumn('attempts', 'integer', (c) => c.notNull().defaultTo(0).check(sql`attempts >= 0`))
    .addColumn('queue_job_id', 'text')
    .addColumn('result', 'jsonb')
    .addColumn('failure', 'jsonb')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await sql`create unique index quilt_plan_job_inputs_idx on quilt_plan_job (quilt_id, quilt_version, inputs_key)`.execute(db);
  await sql`create index quilt_plan_job_owner_open_idx on quilt_plan_job (owner_id) where state in ('queued', 'running')`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('quilt_plan_job').execute();
  await db.schema.dropTable('corner_cost').execute();
}
