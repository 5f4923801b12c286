import { sql, type Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('account')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('email', 'text', (c) => c.notNull())
    .addColumn('display_name', 'text', (c) => c.notNull())
    .addColumn('password_hash', 'text', (c) => c.notNull())
    .addColumn('role', 'text', (c) => c.notNull().defaultTo('quilter').check(sql`role in ('quilter', 'teacher', 'admin')`))
    .addColumn('units', 'text', (c) => c.notNull().defaultTo('in').check(sql`units in ('in', 'cm')`))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  // E-mail is unique regardless of case: Ann@x and ann@x are one account.
  await sql`create unique index account_email_lower_key on account (lower(email))`.execute(db);

  await db.schema
    .createTable('session')
    .addColumn('id', 'text', (c) => c.primaryKey()) // SHA-256 (hex) of the cookie token; the token itself is never stored
    .addColumn('account_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('expires_at', 'timestamptz', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('session_account_idx').on('session').column('account_id').execute();

  await db.schema
    .createTable('password_reset')
    .addColumn('id', 'text', (c) => c.primaryKey()) // SHA-256 (hex) of the e-mailed token
    .addColumn('account_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('expires_at', 'timestamptz', (c) => c.notNull())
    .addColumn('used_at', 'timestamptz')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable('email_message')
    .addColumn('id', 'bigserial', (c) => c.primaryKey())
    .addColumn('to_address', 'text', (c) => c.notNull())
    .addColumn('subject', 'text', (c) => c.notNull())
    .addColumn('body_text', 'text', (c) => c.notNull())
    .addColumn('body_html', 'text')
    .addColumn('kind', 'text', (c) => c.notNull())
    // Set for messages that must go out once only (e.g. a lesson release per student).
    .addColumn('dedupe_key', 'text', (c) => c.unique())
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('pending').check(sql`status in ('pending', 'sent', 'failed')`))
    .addColumn('attempts', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('last_error', 'text')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('sent_at', 'timestamptz')
    .execute();

  await db.schema
    .createTable('rate_limit')
    .addColumn('key', 'text', (c) => c.primaryKey())
    .addColumn('hits', 'integer', (c) => c.notNull())
    .addColumn('window_ends_at', 'timestamptz', (c) => c.notNull())
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of ['rate_limit', 'email_message', 'password_reset', 'session', 'account']) {
    await db.schema.dropTable(table).execute();
  }
}
