import { describe, expect, it } from 'vitest';
import { fieldMessages, plainIssue } from '@shared/forms/plainMessages.ts';
import { badAddresses, createLessonSchema, inviteSchema, updateClassSchema, updateLessonSchema } from './class.schema.ts';
import { newVersionSchema } from '../templates/template.schema.ts';

// A partial update must not invent values for fields it was not given (zod's .partial() keeps defaults). The one
// default is `confirmed: false`: the request's answer to a date question (teachingDates.ts), never a stored field.
describe('update schemas leave absent fields absent', () => {
  it('class', () => expect(updateClassSchema.parse({ description: 'x' })).toEqual({ description: 'x', confirmed: false }));
  it('lesson', () => expect(updateLessonSchema.parse({ releaseAt: '2027-01-01T09:00:00Z' })).toEqual({ releaseAt: '2027-01-01T09:00:00Z', confirmed: false }));
  it('template version', () => expect(newVersionSchema.parse({ title: 'v2' })).toEqual({ title: 'v2' }));
});

describe('teaching form messages name the field (shared/forms/plainMessages.ts)', () => {
  it('leaves bad invitation addresses to badAddresses (the answer names them all at once), and words dates and lengths plainly', () => {
    // The schema takes the list as typed; the invitation service refuses it whole, naming every entry badAddresses finds.
    expect(inviteSchema.safeParse({ emails: ['wren@example.org', 'not-an-address'] }).success).toBe(true);
    expect(badAddresses(['wren@example.org', 'not-an-address', 'ann at the guild'])).toEqual(['not-an-address', 'ann at the guild']);
    const lesson = createLessonSchema.safeParse({ title: 'x'.repeat(201), releaseAt: 'next Tuesday', templateVersionId: 'nope' }, { error: plainIssue });
    if (lesson.success) throw new Error('expected a refusal');
    expect(fieldMessages(lesson.error)).toEqual({
      title: 'Title can be at most 200 characters long.',
      releaseAt: 'Release date must be a date and time, e.g. 2027-01-15T09:00:00Z.',
      templateVersionId: 'Choose a template version.',
    });
  });
});
