// A lesson-sized block for the walkthrough browser tests, built through the real APIs: a 12 in half-square
// triangle with ribbon candy in the top-left triangle and straight lines in the bottom-right one (W's motif
// generators), the planner's route kept (PUT /api/designs/:id/route), then published as a template.
import { buildPiecedLayout } from '@shared/layouts/piecedLayouts.ts';
import { generateMotif } from '@shared/motifs/motifs.ts';
import type { TestAccount } from '../helpers/accounts.ts';

export function ribbonCandyBlock(): Record<string, unknown> {
  const layout = buildPiecedLayout('half-square-triangle', 12, 12);
  const patch = (name: string) => layout.patches.find((p) => p.name === name)!.polygon;
  const candy = generateMotif(patch('top-left triangle'), { kind: 'ribbon-candy', pitch: 2 });
  const lines = generateMotif(patch('bottom-right triangle'), { kind: 'straight-lines', spacing: 3, angle: 0 });
  if (!candy.ok || !lines.ok) throw new Error('tests/browser/walkthroughFixtures: motif generation failed');
  return { version: 1, units: 'in', width: 12, height: 12, seams: layout.seams, lines: [...candy.value.lines, ...lines.value.lines], start: [0, 0], edgeTravel: true };
}

async function ok(p: Promise<{ status: number; body: any; text: string }>, status: number): Promise<any> {
  const res = await p;
  if (res.status !== status) throw new Error(`tests/browser/walkthroughFixtures: expected ${status}, got ${res.status}: ${res.text}`);
  return res.body;
}

/** Creates the design, keeps the planned route and publishes it as a template; returns the template's ids. */
export async function publishRibbonCandyTemplate(teacher: TestAccount, visibility: 'public' | 'class', title: string): Promise<{ templateId: string; versionId: string; strokes: number }> {
  const created = await ok(teacher.client.post('/api/designs', { title, design: ribbonCandyBlock() }), 201);
  const saved = await ok(teacher.client.put(`/api/designs/${created.design.id}/route`, { kind: 'planned', designVersion: created.design.version }), 200);
  const published = await ok(
    teacher.client.post('/api/templates', {
      designId: created.design.id,
      title,
      description: 'Ribbon candy in the top-left triangle, straight lines in the other. Press the block before you start.',
      difficulty: 'beginner',
      motifs: ['ribbon candy', 'straight lines'],
      visibility,
    }),
    201,
  );
  return { templateId: published.template.id, versionId: published.version.id, strokes: saved.route.strokes.length };
}
