import { useMemo } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { parseWalkthroughInput } from '@shared/walkthrough/walkthroughInput.ts';
import { useProgressSync } from './useProgressSync.ts';
import { WalkthroughView } from './WalkthroughView.tsx';

export interface TemplateWalkthroughProps {
  readonly title: string;
  readonly description: string;
  readonly design: unknown;
  readonly route: unknown;
  /** The viewer's units (step lengths are written in them); the design's own when not given. */
  readonly viewerUnits?: Units | undefined;
}

/** The walkthrough of any template one can see, outside classes: nothing is saved. */
export function TemplateWalkthrough({ title, description, design, route, viewerUnits }: TemplateWalkthroughProps) {
  const input = useMemo(() => parseWalkthroughInput(design, route, viewerUnits), [design, route, viewerUnits]);
  const progress = useProgressSync(null, false);
  const lessonText = useMemo(() => [description], [description]);
  if (!input.ok) return <p className="rounded border border-madder-500 bg-white p-4 text-lg" role="alert">{input.error}</p>;
  return <WalkthroughView title={title} design={input.value.design} route={input.value.route} lessonText={lessonText} initialStep={0} progress={progress} />;
}
