import { describe, expect, it } from 'vitest';
import { updateClassSchema, updateLessonSchema } from './class.schema.ts';
import { newVersionSchema } from '../templates/template.schema.ts';

// A partial update must not invent values for fields it was not given (zod's .partial() keeps defaults). The one
// default is `confirmed: false`: the request's answer to a date question (teachingDates.ts), never a stored field.
describe('update schemas leave absent fields absent', () => {
  it('class', () => expect(updateClassSchema.parse({ description: 'x' })).toEqual({ description: 'x', confirmed: false }));
  it('lesson', () => expect(updateLessonSchema.parse({ releaseAt: '2027-01-01T09:00:00Z' })).toEqual({ releaseAt: '2027-01-01T09:00:00Z', confirmed: false }));
  it('template version', () => expect(newVersionSchema.parse({ title: 'v2' })).toEqual({ title: 'v2' }));
});
