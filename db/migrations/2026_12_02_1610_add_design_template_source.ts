import type { Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
// A design copied from a template remembers the exact published version it came from (attribution).
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('design')
    .addColumn('copied_from_template_version_id', 'uuid', (c) => c.references('template_version.id').onDelete('set null'))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('design').dropColumn('copied_from_template_version_id').execute();
}
