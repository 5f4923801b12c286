// The HTTP side of printed plans: the query (`layout`), the PDF answer with a safe file name, and failures as the
// one error shape. The three endpoints (designs, lessons, quilts …/plan.pdf) share it.
import { assertNever } from '@shared/assertNever.ts';
import { PRINT_LAYOUTS, type PrintLayout } from '@shared/print/blockPlacement.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { designProblemResponse, engineFailureResponse } from '../designs/designHttp.ts';
import { problem } from '../http.ts';
import { renderPlanPdf, type PrintPlan } from './planPdf.ts';
import type { PrintFailure } from './printPlan.service.ts';

/**
 * `?layout=page` (default: one page per block, true size when it fits, else drawn smaller and said so) or
 * `?layout=tiles` (true size always: a block too big for the paper is tiled). Anything else, or the parameter
 * twice, or another parameter, is 400 naming the field.
 */
export function readPrintQuery(url: URL): Result<PrintLayout, Response> {
  for (const key of new Set(url.searchParams.keys())) {
    if (key !== 'layout') return err(problem(400, 'invalid_input', `The query parameter “${key.slice(0, 40)}” is not used here; use layout=page or layout=tiles.`, { [key.slice(0, 40)]: 'Not accepted here.' }));
  }
  const values = url.searchParams.getAll('layout');
  if (values.length === 0) return ok('page');
  const v = values[0]!;
  if (values.length > 1 || !(PRINT_LAYOUTS as readonly string[]).includes(v)) {
    return err(problem(400, 'invalid_input', 'Layout must be “page” (one page per block) or “tiles” (true size on several pages).', { layout: 'Must be page or tiles.' }));
  }
  return ok(v as PrintLayout);
}

/** A file name from a title: letters and digits kept, the rest one hyphen; never empty. */
export function pdfFileName(title: string, suffix = 'plan'): string {
  const stem = title.normalize('NFC').replace(/[^\p{L}\p{N}]+/gu, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'threadway';
  return `${stem}-${suffix}.pdf`;
}

/**
 * Writes the PDF and answers it as a download. The document is written page by page with a yield to the event
 * loop between blocks (setImmediate), so other requests are served while a long quilt plan is written.
 */
export async function pdfResponse(plan: PrintPlan, fileName: string): Promise<Response> {
  const bytes = await renderPlanPdf(plan, { between: () => new Promise((resolve) => setImmediate(resolve)) });
  return new Response(new Uint8Array(bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-length': String(bytes.length),
      // ASCII fallback for old clients, the UTF-8 name for the rest (RFC 6266 §4.3, RFC 8187).
      'content-disposition': `attachment; filename="${fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(fileName)}`,
      'cache-control': 'no-store',
      'content-security-policy': "default-src 'none'",
    },
  });
}

/** A failure to gather the plan, as the one error shape. */
export function printFailureResponse(f: PrintFailure): Response {
  switch (f.kind) {
    case 'engine':
      return engineFailureResponse(f.failure);
    case 'problem':
      return designProblemResponse(f.problem);
    case 'unreadable':
      return problem(422, 'invalid_input', f.message);
    default:
      return assertNever(f);
  }
}
