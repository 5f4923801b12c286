// Mounts the lesson walkthrough into the lesson page's mount point (#walkthrough-root), reading the lesson JSON
// the page embeds in #walkthrough-data (the same document as GET /api/lessons/:id). The page's static block
// preview stays until this runs, so the lesson still shows its block without JavaScript.
import '../zodJitless.ts'; // first: before any schema is built (see the file)
import { createRoot } from 'react-dom/client';
import { LessonWalkthrough, lessonDataSchema } from './LessonWalkthrough.tsx';

const root = document.getElementById('walkthrough-root');
const dataEl = document.getElementById('walkthrough-data');
if (root && dataEl) {
  const parsed = lessonDataSchema.safeParse(JSON.parse(dataEl.textContent || 'null'));
  if (parsed.success) {
    const progressUrl = root.dataset['canSave'] === 'true' ? (root.dataset['progressUrl'] ?? null) : null;
    const studentId = progressUrl ? (root.dataset['studentId'] ?? null) : null;
    const units = root.dataset['viewerUnits'];
    const viewerUnits = units === 'in' || units === 'cm' ? units : undefined;
    root.replaceChildren();
    // The island shows the student's place itself, from the same state as the step card (the page's line is for
    // readers without JavaScript and would go stale as the student moves on).
    document.querySelector('[data-progress]')?.remove();
    createRoot(root).render(<LessonWalkthrough data={parsed.data} progressUrl={progressUrl} studentId={studentId} viewerUnits={viewerUnits} />);
  }
}
