import type { APIContext } from 'astro';

/** The client's address as the Node adapter reports it (X-Forwarded-For first, then the socket). */
export function clientIp(context: Pick<APIContext, 'clientAddress'>): string {
  try {
    return context.clientAddress || 'unknown';
  } catch {
    return 'unknown';
  }
}
