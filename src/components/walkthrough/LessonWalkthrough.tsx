import { useMemo } from 'react';
import { z } from 'zod';
import type { Units } from '@shared/design/design.schema.ts';
import { parseWalkthroughInput } from '@shared/walkthrough/walkthroughInput.ts';
import { useProgressSync } from './useProgressSync.ts';
import { WalkthroughView } from './WalkthroughView.tsx';

/** The part of GET /api/lessons/:id (T1) the walkthrough reads; the page embeds the same JSON. */
export const lessonDataSchema = z.object({
  lesson: z.object({ id: z.string(), title: z.string(), notesHtml: z.string().default('') }),
  standing: z.string(),
  template: z.object({ title: z.string(), design: z.unknown(), route: z.unknown() }),
  progress: z.object({ stepIndex: z.number(), totalSteps: z.number(), finished: z.boolean() }).nullable(),
});
export type LessonData = z.infer<typeof lessonDataSchema>;

export interface LessonWalkthroughProps {
  readonly data: LessonData;
  /** PUT target for progress; null when this viewer has nothing to save (a teacher previewing). */
  readonly progressUrl: string | null;
  /** The viewer's units (step lengths are written in them); the design's own when not given. */
  readonly viewerUnits?: Units | undefined;
}

/** A lesson's walkthrough: resumes at the student's saved step and saves progress as they go. */
export function LessonWalkthrough({ data, progressUrl, viewerUnits }: LessonWalkthroughProps) {
  const input = useMemo(() => parseWalkthroughInput(data.template.design, data.template.route, viewerUnits), [data, viewerUnits]);
  const progress = useProgressSync(progressUrl, data.progress?.finished ?? false);
  const lessonText = useMemo(() => [textOf(data.lesson.notesHtml)], [data]);
  if (!input.ok) return <p className="rounded border border-madder-500 bg-white p-4 text-lg" role="alert">{input.error}</p>;
  const saved = data.progress;
  // Resume only if the saved place belongs to a walkthrough of the same length (the template version is fixed per lesson).
  const initialStep = saved && saved.totalSteps > 0 ? saved.stepIndex : 0;
  return <WalkthroughView title={data.template.title} design={input.value.design} route={input.value.route} lessonText={lessonText} initialStep={initialStep} progress={progress} />;
}

function textOf(html: string): string {
  return html.replace(/<[^>]*>/g, ' ');
}
