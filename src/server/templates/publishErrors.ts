// HTTP answers for the expected ways publishing can fail.
import { assertNever } from '@shared/assertNever.ts';
import { problem } from '../http.ts';
import type { PublishError } from './template.service.ts';

export function publishErrorResponse(e: PublishError): Response {
  switch (e.kind) {
    case 'not-found':
      return problem(400, 'invalid_input', 'That design was not found among your designs.', { designId: 'Choose one of your own designs.' });
    case 'no-route':
      return problem(409, 'conflict', 'Plan or save a route for this design first: a template carries its route.', { designId: 'This design has no saved route.' });
    case 'stale-route':
      return problem(409, 'conflict', `The saved route belongs to version ${e.routeVersion} of the design, but the design is now at version ${e.designVersion}. Plan or save the route again first.`, {
        designId: 'The saved route is out of date.',
      });
    case 'template-not-found':
      return problem(404, 'not_found', 'Not found.');
    default:
      return assertNever(e);
  }
}
