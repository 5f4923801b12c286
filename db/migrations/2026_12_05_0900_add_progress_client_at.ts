import type { Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
// Walkthrough progress made offline is queued on the device and sent when the connection is back, possibly more
// than once and after newer progress from another tab or device. client_at is the instant the student made the
// saved move (the device's clock, as sent); a save older than the stored one is ignored, so a re-sent or late
// save never moves the student back. Null for rows written before this migration (and by clients that send none).
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('lesson_progress').addColumn('client_at', 'timestamptz').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('lesson_progress').dropColumn('client_at').execute();
}
