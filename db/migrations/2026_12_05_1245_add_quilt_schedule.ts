import type { Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
// A quilt's schedule: the class it belongs to (a teacher's quilt-along, or a student's quilt made in the class), whose
// dated lessons give one block each; without a class, one block a month from schedule_start (a calendar date; null:
// the day the quilt was made). A deleted class leaves the quilt on its monthly schedule.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('quilt')
    .addColumn('class_id', 'uuid', (c) => c.references('class.id').onDelete('set null'))
    .addColumn('schedule_start', 'date')
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('quilt').dropColumn('class_id').dropColumn('schedule_start').execute();
}
