// GET /api/quilts — my live quilts, most recently saved first (no maps).
// POST /api/quilts { title, quilt } — create; 201 { quilt }. Placements must name my own live designs (400 naming
//   the placement otherwise).
import type { APIRoute } from 'astro';
import { createQuiltSchema, type QuiltList } from '@shared/contract/quilts.ts';
import { db } from '@server/db.ts';
import { json, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { createQuilt, listQuilts, toQuiltRecord } from '@server/quilts/quilt.service.ts';
import { QUILT_BODY_LIMIT, quiltFailureResponse } from '@server/quilts/quiltHttp.ts';

export const GET = (async ({ locals }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  return json({ quilts: await listQuilts(db, signedIn.value.user.id) } satisfies QuiltList);
}) satisfies APIRoute;

export const POST = (async ({ locals, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, createQuiltSchema, QUILT_BODY_LIMIT);
  if (!body.ok) return body.error;
  const created = await createQuilt(db, signedIn.value.user.id, body.value);
  if (!created.ok) return quiltFailureResponse(created.error);
  return json({ quilt: toQuiltRecord(created.value) }, 201);
}) satisfies APIRoute;
