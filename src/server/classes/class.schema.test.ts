import { describe, expect, it } from 'vitest';
import { fieldMessages, plainIssue } from '@shared/forms/plainMessages.ts';
import { createLessonSchema, inviteSchema, updateClassSchema, updateLessonSchema } from './class.schema.ts';
import { newVersionSchema } from '../templates/template.schema.ts';

// A partial update must not invent values for fields it was not given (zod's .partial() keeps defaults).
describe('update schemas leave absent fields absent', () => {
  it('class', () => expect(updateClassSchema.parse({ description: 'x' })).toEqual({ description: 'x' }));
  it('lesson', () => expect(updateLessonSchema.parse({ releaseAt: '2027-01-01T09:00:00Z' })).toEqual({ releaseAt: '2027-01-01T09:00:00Z' }));
  it('template version', () => expect(newVersionSchema.parse({ title: 'v2' })).toEqual({ title: 'v2' }));
});

describe('teaching form messages name the field (shared/forms/plainMessages.ts)', () => {
  it('names each bad invitation address by its place in the list, and words dates and lengths plainly', () => {
    const invite = inviteSchema.safeParse({ emails: ['wren@example.org', 'not-an-address'] }, { error: plainIssue });
    if (invite.success) throw new Error('expected a refusal');
    expect(fieldMessages(invite.error)).toEqual({ 'emails.1': 'Address 2 is not an e-mail address, like name@example.org.' });
    const lesson = createLessonSchema.safeParse({ title: 'x'.repeat(201), releaseAt: 'next Tuesday', templateVersionId: 'nope' }, { error: plainIssue });
    if (lesson.success) throw new Error('expected a refusal');
    expect(fieldMessages(lesson.error)).toEqual({
      title: 'Title can be at most 200 characters long.',
      releaseAt: 'Release date must be a date and time, e.g. 2027-01-15T09:00:00Z.',
      templateVersionId: 'Choose a template version.',
    });
  });
});
