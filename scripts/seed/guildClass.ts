// Marigold's published template and her "Tuesday quilt-along" class (invented demo content). The template is
// published through the app's own publishTemplate (from her seeded design and its planned route); the class and
// its two lessons through class.service, in one transaction; the enrollments as a join code does. Idempotent by
// owner + title.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { publishTemplate } from '@server/templates/template.service.ts';
import { findOwnedVersionIdByTitle } from '@server/templates/template.repository.ts';
import { createClass, createLesson } from '@server/classes/class.service.ts';
import { enrollStudent, findTaughtClassIdByTitle } from '@server/classes/class.repository.ts';
import { inTransaction } from '@server/transaction.repository.ts';
import { seedDesign } from './guildDesigns.ts';
import { marigoldDrawing } from './guildDrawings.ts';

const TEMPLATE_TITLE = 'Pinwheel in the ditch';
const CLASS_TITLE = 'Tuesday quilt-along';
const DAY_MS = 24 * 60 * 60 * 1000;

/** The id of Marigold's published template version 1, publishing it first if needed; `added` counts new rows' owners. */
async function seedTemplateVersion(db: Kysely<Database>, teacherId: string): Promise<{ versionId: string; added: number }> {
  const existing = await findOwnedVersionIdByTitle(db, teacherId, TEMPLATE_TITLE);
  if (existing) return { versionId: existing, added: 0 };
  const source = await seedDesign(db, teacherId, marigoldDrawing());
  const published = await publishTemplate(db, teacherId, {
    designId: source.id,
    title: TEMPLATE_TITLE,
    description: 'A 12 in pinwheel quilted in the ditch in one pass: a first block for walking-foot quilters.',
    difficulty: 'beginner',
    motifs: ['stitch in the ditch'],
    visibility: 'public',
  });
  if (!published.ok) throw new Error(`scripts/seed/guildClass: publishing "${TEMPLATE_TITLE}" failed: ${JSON.stringify(published.error)}`);
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
  let classId = await findTaughtClassIdByTitle(db, teacherId, CLASS_TITLE);
  let classes = 0;
  if (!classId) {
    const startsOn = new Date(now.getTime() - 14 * DAY_MS).toISOString().slice(0, 10);
    classId = await inTransaction(db, async (trx) => {
      const created = await createClass(trx, teacherId, {
        title: CLASS_TITLE,
        description: 'Heron Bend Quilt Guild meets on Tuesday evenings to quilt one block a month together.',
        startsOn,
        priceCents: null,
        currency: null,
      });
      await createLesson(trx, created, {
        title: 'Week 1: the pinwheel in the ditch',
        releaseAt: new Date(now.getTime() - 7 * DAY_MS).toISOString(),
        notes: 'Start at the centre and follow the route: every seam is sewn once, in one pass.',
        templateVersionId: versionId,
      });
      await createLesson(trx, created, {
        title: 'Week 2: echoes around the blades',
        releaseAt: new Date(now.getTime() + 30 * DAY_MS).toISOString(),
        notes: 'Bring your week 1 block; we add echo lines inside each blade.',
        templateVersionId: versionId,
      });
      return created;
    });
    classes = 1;
  }
  let enrollments = 0;
  for (const studentId of studentIds) if (await enrollStudent(db, classId, studentId, 'join-code')) enrollments += 1;
  return { templates, classes, enrollments };
}
