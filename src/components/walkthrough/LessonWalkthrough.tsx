import { useEffect, useMemo, useState } from 'react';
import { z } from 'zod';
import type { Units } from '@shared/design/design.schema.ts';
import { choosePlace, findQueued } from '@shared/walkthrough/progressQueue.ts';
import { parseWalkthroughInput } from '@shared/walkthrough/walkthroughInput.ts';
import { keepLessonOffline, type OfflineReadiness } from './offlineLesson.ts';
import { loadProgressQueue } from './progressStore.ts';
import { useProgressSync } from './useProgressSync.ts';
import { WalkthroughView } from './WalkthroughView.tsx';

/** The part of GET /api/lessons/:id (T1) the walkthrough reads; the page embeds the same JSON. */
export const lessonDataSchema = z.object({
  lesson: z.object({ id: z.string(), title: z.string(), notesHtml: z.string().default('') }),
  standing: z.string(),
  template: z.object({ title: z.string(), design: z.unknown(), route: z.unknown() }),
  progress: z.object({ stepIndex: z.number(), totalSteps: z.number(), finished: z.boolean(), clientAt: z.string().nullable().default(null) }).nullable(),
});
export type LessonData = z.infer<typeof lessonDataSchema>;

export interface LessonWalkthroughProps {
  readonly data: LessonData;
  /** PUT target for progress; null when this viewer has nothing to save (a teacher previewing). */
  readonly progressUrl: string | null;
  /** The signed-in student (progress kept on the device is theirs alone); null with `progressUrl` null. */
  readonly studentId: string | null;
  /** The viewer's units (step lengths are written in them); the design's own when not given. */
  readonly viewerUnits?: Units | undefined;
}

/**
 * A lesson's walkthrough: resumes at the student's place (the device's queued place when it is newer than the page's,
 * e.g. a copy opened offline), saves progress as they go, and keeps the lesson on the device for working offline.
 */
export function LessonWalkthrough({ data, progressUrl, studentId, viewerUnits }: LessonWalkthroughProps) {
  const input = useMemo(() => parseWalkthroughInput(data.template.design, data.template.route, viewerUnits), [data, viewerUnits]);
  const lessonId = data.lesson.id;
  const target = useMemo(() => (progressUrl && studentId ? { url: progressUrl, lessonId, studentId } : null), [progressUrl, lessonId, studentId]);
  const [place] = useState(() => (target ? choosePlace(data.progress, findQueued(loadProgressQueue(), lessonId, target.studentId)) : data.progress));
  const progress = useProgressSync(target, place?.finished ?? false);
  const lessonText = useMemo(() => [textOf(data.lesson.notesHtml)], [data]);
  const [offline, setOffline] = useState<OfflineReadiness | null>(target ? 'keeping' : null);
  useEffect(() => {
    if (!target) return;
    let live = true;
    void keepLessonOffline(target.studentId, lessonId).then((r) => live && setOffline(r));
    return () => {
      live = false;
    };
  }, [target, lessonId]);
  if (!input.ok) return <p className="rounded border border-madder-500 bg-white p-4 text-lg" role="alert">{input.error}</p>;
  // Resume only if the saved place belongs to a walkthrough of the same length (the template version is fixed per lesson).
  const initialStep = place && place.totalSteps > 0 ? place.stepIndex : 0;
  return <WalkthroughView title={data.template.title} design={input.value.design} route={input.value.route} lessonText={lessonText} initialStep={initialStep} progress={progress} offline={offline} />;
}

function textOf(html: string): string {
  return html.replace(/<[^>]*>/g, ' ');
}
