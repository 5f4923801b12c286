import { sql, type Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
// Issue 10 (sign-in, sign-up, password and photo-cap defects):
// - rate_limit.next_at: the earliest time the next attempt may start (progressive slow-down per account);
// - sign_up_request: a sign-up waits here until the e-mailed link is used, so the answer to "sign up" never
//   says whether the address already has an account;
// - a password change by any path ends every unused reset link (trigger), whatever code made the change;
// - at most 12 photos per student and lesson, checked under a per-(lesson, student) lock, so parallel uploads
//   cannot pass the count together.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('rate_limit').addColumn('next_at', 'timestamptz').execute();

  await db.schema
    .createTable('sign_up_request')
    .addColumn('id', 'text', (c) => c.primaryKey()) // SHA-256 (hex) of the e-mailed token
    .addColumn('email', 'text', (c) => c.notNull())
    .addColumn('display_name', 'text', (c) => c.notNull())
    .addColumn('password_hash', 'text', (c) => c.notNull())
    .addColumn('units', 'text', (c) => c.notNull().check(sql`units in ('in', 'cm')`))
    .addColumn('expires_at', 'timestamptz', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await sql`create index sign_up_request_email_idx on sign_up_request (lower(email))`.execute(db);

  await sql`create function account_password_changed() returns trigger language plpgsql as $$
    begin
      update password_reset set used_at = now() where account_id = new.id and used_at is null;
      return null;
    end $$`.execute(db);
  await sql`create trigger account_password_changed after update of password_hash on account
    for each row when (old.password_hash is distinct from new.password_hash) execute function account_password_changed()`.execute(db);

  await sql`create function lesson_photo_cap() returns trigger language plpgsql as $$
    begin
      perform pg_advisory_xact_lock(hashtextextended('lesson_photo:' || new.lesson_id || ':' || new.student_id, 0));
      if (select count(*) from lesson_photo where lesson_id = new.lesson_id and student_id = new.student_id) >= 12 then
        raise exception 'at most 12 photos per student and lesson' using errcode = 'check_violation', constraint = 'lesson_photo_per_student_cap';
      end if;
      return new;
    end $$`.execute(db);
  await sql`create trigger lesson_photo_cap before insert on lesson_photo for each row execute function lesson_photo_cap()`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop trigger lesson_photo_cap on lesson_photo`.execute(db);
  await sql`drop function lesson_photo_cap()`.execute(db);
  await sql`drop trigger account_password_changed on account`.execute(db);
  await sql`drop function account_password_changed()`.execute(db);
  await db.schema.dropTable('sign_up_request').execute();
  await db.schema.alterTable('rate_limit').dropColumn('next_at').execute();
}
