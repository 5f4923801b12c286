// GET /api/designs/:id/export.svg — the design at true size as an SVG file (with the saved route when it was
// computed for the current version; otherwise the quilting lines, and a remark that the route is out of date).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { findDesignRoute } from '@server/designs/design.repository.ts';
import { engineFailureResponse, requireOwnedDesign } from '@server/designs/designHttp.ts';
import { toSavedRouteJson } from '@server/designs/designRecord.ts';
import { runCodec } from '@server/engine/enginePool.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const { row } = owned.value;
  const routeRow = await findDesignRoute(db, row.id);
  const route = routeRow ? toSavedRouteJson(routeRow, row.version) : null;
  // Built in the codec worker: the drawing is parsed there, never on the request thread.
  const built = await runCodec(
    {
      op: 'exportSvg',
      designText: row.data_json,
      options: {
        title: row.title,
        viewerUnits: owned.value.user.units,
        ...(route?.current ? { route: route.strokes } : {}),
        ...(route && !route.current ? { remark: `The saved route was made for version ${route.designVersion}; this is version ${row.version}. Plan the route again.` } : {}),
      },
    },
    owned.value.user.id,
  );
  if (!built.ok) return engineFailureResponse(built.error);
  const svg = built.value;
  const filename = `${row.title.replace(/[^\p{L}\p{N}]+/gu, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'design'}.svg`;
  return new Response(svg, {
    headers: {
      'content-type': 'image/svg+xml; charset=utf-8',
      'content-disposition': `attachment; filename="${filename.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(filename)}`,
      'cache-control': 'no-store',
      // The file is the user's own drawing; never let a browser run anything in it if opened inline.
      'content-security-policy': "default-src 'none'; style-src 'unsafe-inline'",
    },
  });
}) satisfies APIRoute;
