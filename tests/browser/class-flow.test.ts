// The whole teaching flow in headless chromium, on T1's pages with the walkthrough island mounted in the lesson
// page: a teacher starts a class, adds a lesson from a template and invites a student by e-mail; the student follows
// the captured e-mail's link, creates an account, joins, replays the walkthrough to the end (resuming after a
// reload on the way), marks the lesson done and uploads a photo; the teacher sees the progress and the photo.
// Two browsers (fresh profiles): one per person. Screenshots: $TEST_OUTPUT_DIR/screenshots/class-flow-*.png.
import sharp from 'sharp';
import type { Locator } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_PASSWORD, createAccount, uniqueEmail, type TestAccount } from '../helpers/accounts.ts';
import { daysAhead } from '../api/teachingWorld.ts';
import { launchBrowser, screenshot, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { linksIn, waitForMail } from '../helpers/mail.ts';
import { publishRibbonCandyTemplate } from './walkthroughFixtures.ts';

let teacherBrowser: TestBrowser;
let studentBrowser: TestBrowser;
let teacher: TestAccount;
const templateTitle = `Ribbon candy HST ${Date.now()}`;

beforeAll(async () => {
  teacher = await createAccount({ role: 'teacher', displayName: 'Marigold Penhallow' });
  await publishRibbonCandyTemplate(teacher, 'class', templateTitle);
  teacherBrowser = await launchBrowser({ width: 1280, height: 900 });
  studentBrowser = await launchBrowser({ width: 1024, height: 1366 });
});
afterAll(async () => {
  await teacherBrowser?.close();
  await studentBrowser?.close();
  await closeTestDb();
});

/** "2026-12-01T09:30" for a datetime-local input, `offsetMs` from now, in the browser's local time. */
function localDateTime(offsetMs: number): string {
  const d = new Date(Date.now() + offsetMs);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** Submits one of T1's JSON forms and waits for `success`; a refusal fails the test with the form's own messages. */
async function submitAndWait(form: Locator, button: string, success: Locator): Promise<void> {
  await form.getByRole('button', { name: button }).click();
  const alert = form.locator('[data-form-alert]:not([hidden])');
  const refused = alert.waitFor().then(async () => {
    const fields = await form.locator('[data-field-error]').allTextContents();
    throw new Error(`"${button}" was refused: ${await alert.textContent()} ${fields.join('; ')}`);
  });
  await Promise.race([success.waitFor(), refused]);
}

async function photoJpeg(): Promise<Buffer> {
  // A small made-up "block" picture: four coloured squares.
  const square = (r: number, g: number, b: number) => sharp({ create: { width: 200, height: 200, channels: 3, background: { r, g, b } } }).png().toBuffer();
  const [a, b, c, d] = await Promise.all([square(61, 90, 128), square(244, 238, 225), square(181, 71, 58), square(111, 143, 114)]);
  return sharp({ create: { width: 400, height: 400, channels: 3, background: { r: 255, g: 255, b: 255 } } })
    .composite([{ input: a, left: 0, top: 0 }, { input: b, left: 200, top: 0 }, { input: c, left: 0, top: 200 }, { input: d, left: 200, top: 200 }])
    .jpeg()
    .toBuffer();
}

describe('teacher → student → teacher', () => {
  it('runs a class from invitation to a finished lesson with a photo', async () => {
    const t = teacherBrowser.page;
    const s = studentBrowser.page;
    const studentEmail = uniqueEmail('student');
    const classTitle = `Autumn quilt-along ${Date.now()}`;

    // Teacher: sign in, start a class, add a released lesson from the template, invite the student.
    await t.goto('/sign-in?next=/classes/new');
    await t.getByLabel('E-mail').fill(teacher.email);
    await t.getByLabel('Password').fill(teacher.password);
    await t.getByRole('button', { name: 'Sign in' }).click();
    await t.waitForURL('**/classes/new');
    await t.getByLabel('Title').fill(classTitle);
    await t.getByLabel('Description').fill('One block a month, quilted along a planned route.');
    await t.getByLabel('Start date').fill(daysAhead(31));
    await t.getByRole('button', { name: 'Create class' }).click();
    await t.waitForURL(/\/classes\/[0-9a-f-]{36}$/);
    const classUrl = t.url();

    const lessonForm = t.locator('form', { has: t.getByRole('heading', { name: 'Add a lesson' }) });
    await lessonForm.getByLabel('Title').fill('Lesson 1: ribbon candy');
    await lessonForm.getByLabel('Release (your local time)').fill(localDateTime(-60 * 60 * 1000));
    const templateSelect = lessonForm.getByLabel('Template');
    const options = await templateSelect.locator('option').allTextContents();
    const option = options.find((o) => o.includes(templateTitle));
    expect(option, `template options: ${JSON.stringify(options)}`).toBeDefined();
    await templateSelect.selectOption({ label: option! });
    await lessonForm.getByLabel('Notes for students').fill('Press the block first. Start at the **top-left** corner.');
    // A release an hour ago (and before the class's start date) is asked about first.
    await lessonForm.getByRole('button', { name: 'Add lesson' }).click();
    await t.getByRole('dialog').getByRole('button', { name: 'Yes, keep this date' }).click();
    await t.getByRole('link', { name: '1. Lesson 1: ribbon candy' }).waitFor();

    const inviteForm = t.locator('form', { has: t.getByRole('heading', { name: 'Invite by e-mail' }) });
    const invitedAt = new Date();
    await inviteForm.getByLabel('E-mail addresses (one per line)').fill(studentEmail);
    await submitAndWait(inviteForm, 'Send invitations', t.getByText(`${studentEmail}: waiting`));
    await screenshot(t, 'class-flow-01-teacher-class');

    // Student: the invitation e-mail's link, a new account, then the link again to join.
    const mail = await waitForMail(studentEmail, { subject: 'invites you to the class', since: invitedAt });
    const link = linksIn(mail.text).find((l) => l.includes('/invitations/'));
    expect(link, mail.text).toBeDefined();
    await s.goto(link!);
    await s.getByText('Marigold Penhallow').first().waitFor();
    await screenshot(s, 'class-flow-02-invitation');
    // Signing up on the invitation page joins the class on the way (the e-mail address comes filled in).
    const join = s.locator('form', { has: s.getByRole('heading', { name: /Create an account and join/ }) });
    expect(await join.getByLabel('E-mail').inputValue()).toBe(studentEmail);
    await join.getByLabel('Your name').fill('Bryony Tuckett');
    await join.getByLabel('Password').fill(DEFAULT_PASSWORD);
    await join.getByRole('button', { name: 'Create account and join' }).click();
    await s.waitForURL((u) => u.href === classUrl);
    await s.getByRole('link', { name: 'Open lesson' }).click();

    // The walkthrough island replaces the lesson page's static preview.
    await s.getByTestId('walkthrough').waitFor();
    const counter = s.getByTestId('step-counter');
    expect(await counter.textContent()).toMatch(/^Step 1 of \d+ · Pass 1 of 1$/);
    const total = Number(/of (\d+)/.exec((await counter.textContent())!)![1]);
    const safety = (await s.getByRole('note', { name: 'Safety' }).textContent())!;
    expect(safety).toContain('fingers clear of the needle');
    expect(safety).toContain('iron'); // the lesson notes say to press the block
    await screenshot(s, 'class-flow-03-walkthrough-start');

    // Two steps on, the place is saved on the server; a reload resumes there.
    const saved = s.waitForResponse((r) => r.url().endsWith('/progress') && r.request().method() === 'PUT' && (r.request().postDataJSON() as { stepIndex: number }).stepIndex === 2);
    await s.getByRole('button', { name: 'Next ▶' }).click();
    await s.getByRole('button', { name: 'Next ▶' }).click();
    expect(await counter.textContent()).toMatch(/^Step 3 of /);
    expect((await saved).ok()).toBe(true);
    await s.reload();
    await s.getByTestId('walkthrough').waitFor();
    expect(await counter.textContent()).toMatch(/^Step 3 of /);
    expect(await s.locator('[data-progress]').textContent()).toBe(`You are on step 3 of ${total}.`);
    await screenshot(s, 'class-flow-04-walkthrough-resumed');

    // Replay the rest without pausing between steps, at the fastest speed, to the last step.
    await s.getByLabel('Pause after each step').uncheck();
    await s.getByLabel('Stitches per minute').fill('3000');
    await s.getByRole('radio', { name: '4×' }).click();
    await s.getByRole('button', { name: '▶ Play step' }).click();
    await s.waitForFunction((n) => document.querySelector('[data-testid=step-counter]')?.textContent?.startsWith(`Step ${n} of ${n}`), total, { timeout: 60_000 });
    expect(await s.getByTestId('step-instruction').textContent()).toMatch(/^Tie off: pass 1 ends at /);
    const done = s.waitForResponse((r) => r.url().endsWith('/progress') && r.request().method() === 'PUT' && (r.request().postDataJSON() as { finished: boolean }).finished);
    await s.getByRole('button', { name: 'Mark lesson done' }).click();
    expect((await done).ok()).toBe(true);
    await s.getByTestId('save-state').filter({ hasText: 'You finished this lesson.' }).waitFor();
    await screenshot(s, 'class-flow-05-walkthrough-done');

    // Photo of the finished block.
    await s.locator('input[type=file][name=photo]').setInputFiles({ name: 'my-block.jpg', mimeType: 'image/jpeg', buffer: await photoJpeg() });
    await s.getByRole('button', { name: 'Upload photo' }).click();
    await s.getByRole('img', { name: /front/ }).first().waitFor();
    await screenshot(s, 'class-flow-06-photo-uploaded');

    // Teacher: the roster shows the lesson done and one photo; the photo is in the class gallery.
    await t.goto(classUrl);
    const row = t.getByRole('row', { name: /Bryony Tuckett/ });
    await row.waitFor();
    const cells = await row.getByRole('cell').allTextContents();
    expect(cells).toEqual(['1 of 1', 'Lesson 1: ribbon candy', 'done', expect.any(String), '1']);
    const photo = t.getByRole('img', { name: /Bryony Tuckett, Lesson 1: ribbon candy, front/ });
    await photo.waitFor();
    await photo.scrollIntoViewIfNeeded(); // lazy-loaded
    await t.waitForFunction((name) => Array.from(document.images).some((i) => i.alt.startsWith(name) && i.complete && i.naturalWidth > 0), 'Bryony Tuckett, Lesson 1');
    expect(await photo.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
    await screenshot(t, 'class-flow-07-teacher-roster-and-photo');
  });
});
