// Serves the built app (dist/server/entry.mjs, @astrojs/node standalone) with one change: the client address.
// Astro's Node adapter takes X-Forwarded-For as the client address whenever a request carries it, so any caller
// could pick the address our rate limits count. Here every request is handed over with X-Forwarded-For set to
// the connecting socket's address, and what the caller sent moved to X-Threadway-Forwarded-For; the app
// (src/server/clientIp.ts) believes that list only when the socket is one of TRUSTED_PROXIES.
// npm start and npm test serve the app through this file; so must a deployment: `node scripts/serve.mjs`.
// Environment as for the adapter: HOST, PORT, SERVER_CERT_PATH + SERVER_KEY_PATH (https).
import { readFileSync } from 'node:fs';
import http from 'node:http';
import https from 'node:https';

process.env.ASTRO_NODE_AUTOSTART = 'disabled';
// Tells the app that the address handed over is the socket's own (see src/server/clientIp.ts).
globalThis[Symbol.for('threadway.peerAddressStamped')] = true;
const { handler, options } = await import('../dist/server/entry.mjs');

const FORWARDED = 'x-forwarded-for';
const CALLER_FORWARDED = 'x-threadway-forwarded-for';

function stampPeerAddress(req) {
  const sent = req.headers[FORWARDED];
  delete req.headers[CALLER_FORWARDED];
  if (sent) req.headers[CALLER_FORWARDED] = Array.isArray(sent) ? sent.join(', ') : sent;
  const peer = req.socket.remoteAddress;
  if (peer) req.headers[FORWARDED] = peer;
  else delete req.headers[FORWARDED];
}

const listener = (req, res) => {
  stampPeerAddress(req);
  handler(req, res);
};
const server =
  process.env.SERVER_CERT_PATH && process.env.SERVER_KEY_PATH
    ? https.createServer({ key: readFileSync(process.env.SERVER_KEY_PATH), cert: readFileSync(process.env.SERVER_CERT_PATH) }, listener)
    : http.createServer(listener);
const port = Number(process.env.PORT ?? options.port ?? 8080);
const host = process.env.HOST ?? (typeof options.host === 'string' ? options.host : options.host ? '0.0.0.0' : 'localhost');
server.listen(port, host, () => {
  console.log(`[serve] Threadway is listening on ${process.env.SERVER_CERT_PATH ? 'https' : 'http'}://${host}:${port}`);
});
