// Marigold's published template and her "Tuesday quilt-along" class (invented demo content). The template is
// published through the app's own publishTemplate (from her seeded design and its planned route); the class,
// its two lessons and the enrollments are written like class.service does. Idempotent by owner + title.
import type { Kysely } from 'kysely';
import type { Database } from '../schema.ts';
import { publishTemplate } from '@server/templates/template.service.ts';
import { enrollStudent } from '@server/classes/class.repository.ts';
import { generateJoinCode } from '@server/classes/joinCode.ts';
import { seedDesign } from './guildDesigns.ts';
import { marigoldDrawing } from './guildDrawings.ts';

const TEMPLATE_TITLE = 'Pinwheel in the ditch';
const CLASS_TITLE = 'Tuesday quilt-along';
const DAY_MS = 24 * 60 * 60 * 1000;

/** The id of Marigold's published template version 1, publishing it first if needed; `added` counts new rows' owners. */
async function seedTemplateVersion(db: Kysely<Database>, teacherId: string): Promise<{ versionId: string; added: number }> {
  const existing = await db
    .selectFrom('template')
    .innerJoin('template_version as tv', 'tv.template_id', 'template.id')
    .select('tv.id')
    .where('template.owner_id', '=', teacherId)
    .where('tv.title', '=', TEMPLATE_TITLE)
    .orderBy('tv.version')
    .executeTakeFirst();
  if (existing) return { versionId: existing.id, added: 0 };
  const source = await seedDesign(db, teacherId, marigoldDrawing());
  const published = await publishTemplate(db, teacherId, {
    designId: source.id,
    title: TEMPLATE_TITLE,
    description: 'A 12 in pinwheel quilted in the ditch in one pass: a first block for walking-foot quilters.',
    difficulty: 'beginner',
    motifs: ['stitch in the ditch'],
    visibility: 'public',
  });
  if (!published.ok) throw new Error(`db/seed/guildClass: publishing "${TEMPLATE_TITLE}" failed: ${JSON.stringify(published.error)}`);
  return { versionId: published.value.version.id, added: 1 };
}

/** Counts of what this run added: templates, classes, enrollments. */
export async function seedGuildClass(
  db: Kysely<Database>,
  teacherId: string,
  studentIds: readonly string[],
  now: Date,
): Promise<{ templates: number; classes: number; enrollments: number }> {
  const { versionId, added: templates } = await seedTemplateVersion(db, teacherId);
  let classRow = await db.selectFrom('class').select('id').where('teacher_id', '=', teacherId).where('title', '=', CLASS_TITLE).executeTakeFirst();
  let classes = 0;
  if (!classRow) {
    const startsOn = new Date(now.getTime() - 14 * DAY_MS).toISOString().slice(0, 10);
    classRow = await db.transaction().execute(async (trx) => {
      const created = await trx
        .insertInto('class')
        .values({
          teacher_id: teacherId,
          title: CLASS_TITLE,
          description: 'Heron Bend Quilt Guild meets on Tuesday evenings to quilt one block a month together.',
          starts_on: startsOn,
          price_cents: null,
          currency: null,
          join_code: generateJoinCode(),
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      await trx
        .insertInto('lesson')
        .values([
          {
            class_id: created.id,
            title: 'Week 1: the pinwheel in the ditch',
            release_at: new Date(now.getTime() - 7 * DAY_MS),
            notes_md: 'Start at the centre and follow the route: every seam is sewn once, in one pass.',
            template_version_id: versionId,
          },
          {
            class_id: created.id,
            title: 'Week 2: echoes around the blades',
            release_at: new Date(now.getTime() + 30 * DAY_MS),
            notes_md: 'Bring your week 1 block; we add echo lines inside each blade.',
            template_version_id: versionId,
          },
        ])
        .execute();
      return created;
    });
    classes = 1;
  }
  let enrollments = 0;
  for (const studentId of studentIds) if (await enrollStudent(db, classRow.id, studentId, 'join-code')) enrollments += 1;
  return { templates, classes, enrollments };
}
