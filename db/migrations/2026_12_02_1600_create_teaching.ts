import { sql, type Kysely } from 'kysely';

// Teaching: templates (immutable published versions), classes with dated lessons, enrolments,
// e-mail invitations, walkthrough progress and lesson photos.
// Frozen in time: never import app code here, never edit after merge.
export async function up(db: Kysely<any>): Promise<void> {
  const now = sql`now()`;

  await db.schema
    .createTable('template')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('owner_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    // Unguessable: the only way to reach an 'unlisted' template (24 random bytes, base32).
    .addColumn('link_token', 'text', (c) => c.notNull().unique())
    .addColumn('visibility', 'text', (c) => c.notNull().check(sql`visibility in ('public', 'class', 'unlisted')`))
    .addColumn('latest_version', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('template_owner_idx').on('template').column('owner_id').execute();

  await db.schema
    .createTable('template_version')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('template_id', 'uuid', (c) => c.notNull().references('template.id').onDelete('cascade'))
    .addColumn('version', 'integer', (c) => c.notNull())
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('description', 'text', (c) => c.notNull())
    .addColumn('difficulty', 'text', (c) => c.notNull().check(sql`difficulty in ('beginner', 'intermediate', 'advanced')`))
    .addColumn('motifs', sql`text[]`, (c) => c.notNull())
    .addColumn('units', 'text', (c) => c.notNull().check(sql`units in ('in', 'cm')`))
    .addColumn('width', 'double precision', (c) => c.notNull())
    .addColumn('height', 'double precision', (c) => c.notNull())
    .addColumn('design', 'jsonb', (c) => c.notNull())
    .addColumn('route', 'jsonb', (c) => c.notNull())
    .addColumn('figures', 'jsonb', (c) => c.notNull())
    // The design it was published from (the teacher's own); no foreign key: designs live in another feature's table.
    .addColumn('source_design_id', 'uuid')
    .addColumn('published_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('template_version_template_version_key', ['template_id', 'version'])
    .execute();
  // Published versions are immutable: students and copies point at them.
  await sql`create function template_version_immutable() returns trigger language plpgsql as $$
    begin raise exception 'template_version rows are immutable; publish a new version'; end $$`.execute(db);
  await sql`create trigger template_version_no_update before update on template_version
    for each row execute function template_version_immutable()`.execute(db);

  await db.schema
    .createTable('class')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('teacher_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('description', 'text', (c) => c.notNull())
    .addColumn('starts_on', 'date', (c) => c.notNull())
    // For a later payments feature: a price in the smallest currency unit (cents), null = free.
    .addColumn('price_cents', 'integer', (c) => c.check(sql`price_cents is null or price_cents >= 0`))
    .addColumn('currency', 'text')
    .addColumn('join_code', 'text', (c) => c.notNull().unique())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('class_teacher_idx').on('class').column('teacher_id').execute();

  await db.schema
    .createTable('lesson')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('class_id', 'uuid', (c) => c.notNull().references('class.id').onDelete('cascade'))
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('release_at', 'timestamptz', (c) => c.notNull())
    .addColumn('notes_md', 'text', (c) => c.notNull())
    .addColumn('template_version_id', 'uuid', (c) => c.notNull().references('template_version.id').onDelete('restrict'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('lesson_class_idx').on('lesson').columns(['class_id', 'release_at']).execute();

  await db.schema
    .createTable('enrollment')
    .addColumn('class_id', 'uuid', (c) => c.notNull().references('class.id').onDelete('cascade'))
    .addColumn('student_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('joined_via', 'text', (c) => c.notNull().check(sql`joined_via in ('invitation', 'join-code')`))
    .addColumn('joined_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .addPrimaryKeyConstraint('enrollment_pkey', ['class_id', 'student_id'])
    .execute();
  await db.schema.createIndex('enrollment_student_idx').on('enrollment').column('student_id').execute();

  await db.schema
    .createTable('class_invitation')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('class_id', 'uuid', (c) => c.notNull().references('class.id').onDelete('cascade'))
    .addColumn('email', 'text', (c) => c.notNull())
    // SHA-256 (hex) of the token's random part; the token itself is only in the e-mail.
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('expires_at', 'timestamptz', (c) => c.notNull())
    .addColumn('used_at', 'timestamptz')
    .addColumn('used_by', 'uuid', (c) => c.references('account.id').onDelete('set null'))
    .addColumn('revoked_at', 'timestamptz')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('class_invitation_class_idx').on('class_invitation').column('class_id').execute();

  await db.schema
    .createTable('lesson_progress')
    .addColumn('lesson_id', 'uuid', (c) => c.notNull().references('lesson.id').onDelete('cascade'))
    .addColumn('student_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('step_index', 'integer', (c) => c.notNull().check(sql`step_index >= 0`))
    .addColumn('total_steps', 'integer', (c) => c.notNull().check(sql`total_steps >= 0`))
    .addColumn('finished_at', 'timestamptz')
    .addColumn('last_active_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .addPrimaryKeyConstraint('lesson_progress_pkey', ['lesson_id', 'student_id'])
    .execute();

  await db.schema
    .createTable('lesson_photo')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('lesson_id', 'uuid', (c) => c.notNull().references('lesson.id').onDelete('cascade'))
    .addColumn('student_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('side', 'text', (c) => c.notNull().check(sql`side in ('front', 'back')`))
    .addColumn('object_key', 'text', (c) => c.notNull())
    .addColumn('thumb_key', 'text', (c) => c.notNull())
    .addColumn('width', 'integer', (c) => c.notNull())
    .addColumn('height', 'integer', (c) => c.notNull())
    .addColumn('bytes', 'integer', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('lesson_photo_lesson_idx').on('lesson_photo').columns(['lesson_id', 'student_id']).execute();

  // Generated once and kept here when INVITE_SECRET is not configured (see src/server/classes/inviteKey.ts).
  await db.schema
    .createTable('server_secret')
    .addColumn('name', 'text', (c) => c.primaryKey())
    .addColumn('value', 'text', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(now))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of ['server_secret', 'lesson_photo', 'lesson_progress', 'class_invitation', 'enrollment', 'lesson', 'class']) {
    await db.schema.dropTable(table).execute();
  }
  await sql`drop trigger template_version_no_update on template_version`.execute(db);
  await sql`drop function template_version_immutable()`.execute(db);
  await db.schema.dropTable('template_version').execute();
  await db.schema.dropTable('template').execute();
}
