// Marigold's two published templates and her "Tuesday quilt-along" class (invented demo content). The template is
// published through the app's own publishTemplate (from her seeded design and its planned route); the class and
// its two lessons through class.service, in one transaction; the enrollments as a join code does. Idempotent by
// owner + title.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { publishTemplate } from '@server/templates/template.service.ts';
import { findOwnedVersionIdByTitle, findVersionById } from '@server/templates/template.repository.ts';
import { parseWalkthroughInput } from '@shared/walkthrough/walkthroughInput.ts';
import { routeNote } from '@shared/walkthrough/routeNote.ts';
import { createClass, createLesson } from '@server/classes/class.service.ts';
import { enrollStudent, findTaughtClassIdByTitle, listLessons, updateLessonRow } from '@server/classes/class.repository.ts';
import { inTransaction } from '@server/transaction.repository.ts';
import { seedDesign } from './guildDesigns.ts';
import { marigoldDrawings, type GuildDrawing } from './guildDrawings.ts';

export const CLASS_TITLE = 'Tuesday quilt-along';
const DAY_MS = 24 * 60 * 60 * 1000;
const WEEK2_TITLE = 'Week 2: echoes around the blades';
const WEEK2_LEAD = 'A second pinwheel: the same ditch lines as week 1, with echoes 1/2 in apart inside each blade, stepping in from one echo to the next.';

interface TemplateRecipe {
  title: string;
  description: string;
  motifs: string[];
  drawing: GuildDrawing;
}

function marigoldTemplates(): { ditch: TemplateRecipe; echoes: TemplateRecipe } {
  const drawings = marigoldDrawings();
  return {
    ditch: {
      title: 'Pinwheel in the ditch',
      description: 'A pinwheel quilted in the ditch in one pass: a first block for walking-foot quilters.',
      motifs: ['stitch in the ditch'],
      drawing: drawings.ditch,
    },
    echoes: {
      title: 'Pinwheel with echoed blades',
      description: 'The same pinwheel with echoes inside each blade, stepping in from ring to ring, still in one pass.',
      motifs: ['stitch in the ditch', 'echo'],
      drawing: drawings.echoes,
    },
  };
}

/** The id of Marigold's published template version 1, publishing it first if needed; `added` counts new templates. */
async function seedTemplateVersion(db: Kysely<Database>, teacherId: string, t: TemplateRecipe): Promise<{ versionId: string; added: number }> {
  const existing = await findOwnedVersionIdByTitle(db, teacherId, t.title);
  if (existing) return { versionId: existing, added: 0 };
  const source = await seedDesign(db, teacherId, t.drawing);
  const published = await publishTemplate(db, teacherId, {
    designId: source.id,
    title: t.title,
    description: t.description,
    difficulty: 'beginner',
    motifs: t.motifs,
    visibility: 'public',
  });
  if (!published.ok) throw new Error(`scripts/seed/guildClass: publishing "${t.title}" failed: ${JSON.stringify(published.error)}`);
  return { versionId: published.value.version.id, added: 1 };
}

/** A lesson note that describes the route the template version really has (read back as it was published). */
async function noteFor(db: Kysely<Database>, versionId: string, lead: string): Promise<string> {
  const version = await findVersionById(db, versionId);
  const input = version ? parseWalkthroughInput(version.design, version.route) : null;
  if (!input?.ok) throw new Error(`scripts/seed/guildClass: template version ${versionId} has no readable route`);
  return `${lead} ${routeNote(input.value.design, input.value.route)}`;
}

/**
 * Databases seeded before the echoes template existed have week 2 pointing at the ditch template, with a note that
 * does not match its route. Point it at the echoes template and rewrite the note (only that lesson, only then).
 */
async function repairWeek2Lesson(db: Kysely<Database>, classId: string, echoesVersionId: string): Promise<void> {
  const week2 = (await listLessons(db, classId, false)).find((l) => l.title === WEEK2_TITLE);
  if (!week2 || week2.template_version_id === echoesVersionId) return;
  await updateLessonRow(db, week2.id, { templateVersionId: echoesVersionId, notesMd: await noteFor(db, echoesVersionId, WEEK2_LEAD) });
}

/** Counts of what this run added: templates, classes, enrollments. */
export async function seedGuildClass(
  db: Kysely<Database>,
  teacherId: string,
  studentIds: readonly string[],
  now: Date,
): Promise<{ templates: number; classes: number; enrollments: number }> {
  const recipes = marigoldTemplates();
  const week1 = await seedTemplateVersion(db, teacherId, recipes.ditch);
  const week2 = await seedTemplateVersion(db, teacherId, recipes.echoes);
  const templates = week1.added + week2.added;
  let classId = await findTaughtClassIdByTitle(db, teacherId, CLASS_TITLE);
  let classes = 0;
  if (!classId) {
    const startsOn = new Date(now.getTime() - 14 * DAY_MS).toISOString().slice(0, 10);
    const week1Notes = await noteFor(db, week1.versionId, 'Every seam of the pinwheel, in the ditch.');
    const week2Notes = await noteFor(db, week2.versionId, WEEK2_LEAD);
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
        notes: week1Notes,
        templateVersionId: week1.versionId,
      });
      await createLesson(trx, created, {
        title: WEEK2_TITLE,
        releaseAt: new Date(now.getTime() + 30 * DAY_MS).toISOString(),
        notes: week2Notes,
        templateVersionId: week2.versionId,
      });
      return created;
    });
    classes = 1;
  } else {
    await repairWeek2Lesson(db, classId, week2.versionId);
  }
  let enrollments = 0;
  for (const studentId of studentIds) if (await enrollStudent(db, classId, studentId, 'join-code')) enrollments += 1;
  classes += await seedPaidClass(db, teacherId, { ditch: week1.versionId, echoes: week2.versionId }, now);
  return { templates, classes, enrollments };
}

const PAID_CLASS_TITLE = 'Evening echoes workshop';

/**
 * Marigold's paid class (45.00 USD), with one lesson out and one to come. Nobody is enrolled: a demo student buys
 * it with its join code on the local payments fake's checkout page (test card 4242 4242 4242 4242). 1 when added.
 */
async function seedPaidClass(db: Kysely<Database>, teacherId: string, versions: { ditch: string; echoes: string }, now: Date): Promise<number> {
  if (await findTaughtClassIdByTitle(db, teacherId, PAID_CLASS_TITLE)) return 0;
  const notes1 = await noteFor(db, versions.ditch, 'We warm up on the pinwheel seams before the echoes.');
  const notes2 = await noteFor(db, versions.echoes, 'Echoes 1/2 in apart inside each blade.');
  await inTransaction(db, async (trx) => {
    const created = await createClass(trx, teacherId, {
      title: PAID_CLASS_TITLE,
      description: 'Two evenings on echo quilting for Heron Bend members, one block each evening. Paid ahead through checkout.',
      startsOn: new Date(now.getTime() - 3 * DAY_MS).toISOString().slice(0, 10),
      priceCents: 4500,
      currency: 'USD',
    });
    await createLesson(trx, created, { title: 'Evening 1: the ditch warm-up', releaseAt: new Date(now.getTime() - 2 * DAY_MS).toISOString(), notes: notes1, templateVersionId: versions.ditch });
    await createLesson(trx, created, { title: 'Evening 2: echoes inside the blades', releaseAt: new Date(now.getTime() + 21 * DAY_MS).toISOString(), notes: notes2, templateVersionId: versions.echoes });
  });
  return 1;
}
