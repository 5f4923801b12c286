import { z } from 'zod';
import { DESIGN_LIMITS, DESIGN_VERSION, designSchema, unitsSchema, type Design } from '@shared/design/design.schema.ts';
import { fieldMessages, plainIssue } from '@shared/forms/plainMessages.ts';
import { buildPiecedLayout, PIECED_LAYOUTS, type PiecedLayoutId } from '@shared/layouts/piecedLayouts.ts';

const layoutIds = PIECED_LAYOUTS.map((l) => l.id) as [PiecedLayoutId, ...PiecedLayoutId[]];

/** The new-design form as the quilter filled it in (strings from inputs are coerced). */
export const newDesignFormSchema = z
  .object({
    title: z.string().trim().min(1, 'Give the design a title.').max(120, 'Keep the title under 120 characters.'),
    units: unitsSchema,
    width: z.coerce.number().finite().positive('The width must be more than 0.'),
    height: z.coerce.number().finite().positive('The height must be more than 0.'),
    layout: z.enum(layoutIds),
  })
  .superRefine((form, ctx) => {
    const max = DESIGN_LIMITS.maxSide[form.units];
    for (const side of ['width', 'height'] as const) {
      if (form[side] > max) ctx.addIssue({ code: 'custom', path: [side], message: `${side === 'width' ? 'Width' : 'Height'} can be at most ${max} ${form.units}: blocks up to ${max} ${form.units} on a side.` });
    }
  });
export type NewDesignForm = z.infer<typeof newDesignFormSchema>;

/** The design a new block starts as: the chosen pieced layout's seam lines at the chosen size, no quilting lines yet. */
export function buildNewDesign(form: NewDesignForm): Design {
  const layout = buildPiecedLayout(form.layout, form.width, form.height);
  return designSchema.parse({
    version: DESIGN_VERSION,
    units: form.units,
    width: form.width,
    height: form.height,
    seams: layout.seams,
    lines: [],
    edgeTravel: true,
  });
}

/** Reads the form; messages come from the shared table (shared/forms/plainMessages.ts), one per field. */
export function readNewDesignForm(input: unknown): { readonly ok: true; readonly form: NewDesignForm } | { readonly ok: false; readonly errors: Record<string, string> } {
  const parsed = newDesignFormSchema.safeParse(input, { error: plainIssue });
  return parsed.success ? { ok: true, form: parsed.data } : { ok: false, errors: fieldMessages(parsed.error) };
}
