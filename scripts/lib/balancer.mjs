// A small round-robin HTTP balancer (node:http) in front of several app instances on loopback: what an operator's
// load balancer does, enough for the multi-instance test and benchmark. Each request goes to the next instance;
// an instance that refuses the connection is skipped for that request (the next one is tried), so a stopped
// instance costs no failed request. It adds X-Forwarded-For with the caller's address, as a real balancer does;
// the instances believe it only when the balancer's address is in their TRUSTED_PROXIES.
import http from 'node:http';

/**
 * Starts the balancer on 127.0.0.1:`port` (0: any free port) in front of `upstreams` (base URLs like
 * http://127.0.0.1:4001). Returns `{ url, port, served, close() }`; `served[i]` counts the requests instance i answered.
 */
export function startBalancer({ upstreams, port = 0 }) {
  const targets = upstreams.map((u) => new URL(u));
  const served = targets.map(() => 0);
  let next = 0;
  const agent = new http.Agent({ keepAlive: true, maxSockets: 256 });

  const server = http.createServer((req, res) => {
    const chunks = [];
    req.on('data', (c) => chunks.push(c));
    req.on('end', () => {
      const body = Buffer.concat(chunks);
      const first = next;
      next = (next + 1) % targets.length;
      forward(req, res, body, first, 0);
    });
  });

  function forward(req, res, body, index, tried) {
    const target = targets[index];
    const headers = { ...req.headers };
    const caller = req.socket.remoteAddress ?? '';
    headers['x-forwarded-for'] = headers['x-forwarded-for'] ? `${headers['x-forwarded-for']}, ${caller}` : caller;
    headers['content-length'] = String(body.length);
    delete headers['transfer-encoding'];
    const upstream = http.request(
      { host: target.hostname, port: target.port, method: req.method, path: req.url, headers, agent },
      (answer) => {
        served[index] += 1;
        res.writeHead(answer.statusCode ?? 502, answer.headers);
        answer.pipe(res);
      },
    );
    upstream.on('error', (error) => {
      // A refused or reset connection before any answer: try the next instance, once round.
      if (!res.headersSent && tried + 1 < targets.length) {
        forward(req, res, body, (index + 1) % targets.length, tried + 1);
        return;
      }
      if (!res.headersSent) {
        res.writeHead(502, { 'content-type': 'application/json' });
        res.end(JSON.stringify({ error: { code: 'bad_gateway', message: `no app instance answered: ${error.code ?? error.message}` } }));
      } else {
        res.destroy(error);
      }
    });
    upstream.end(body);
  }

  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const { port: bound } = server.address();
      resolve({
        url: `http://127.0.0.1:${bound}`,
        port: bound,
        served,
        close: () =>
          new Promise((done) => {
            agent.destroy();
            server.closeAllConnections?.();
            server.close(() => done());
          }),
      });
    });
  });
}
