// The local fake mail server: an SMTP sink on loopback that keeps every message as JSON (+ the raw .eml)
// in a folder. The dev-only mail page and the tests read that folder.
import { mkdirSync, writeFileSync, readdirSync } from 'node:fs';
import path from 'node:path';

export async function startMailSink({ dir, port = 0 }) {
  const { SMTPServer } = await import('smtp-server');
  const { simpleParser } = await import('mailparser');
  mkdirSync(dir, { recursive: true });
  let count = readdirSync(dir).filter((f) => f.endsWith('.json')).length;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, _session, callback) {
      const chunks = [];
      stream.on('data', (c) => chunks.push(c));
      stream.on('end', async () => {
        try {
          const raw = Buffer.concat(chunks);
          const mail = await simpleParser(raw);
          count += 1;
          const id = `${String(count).padStart(6, '0')}-${Date.now()}`;
          const addresses = (field) => (field ? [field].flat().flatMap((a) => a.value.map((v) => v.address)) : []);
          const record = {
            id,
            receivedAt: new Date().toISOString(),
            from: addresses(mail.from)[0] ?? '',
            to: addresses(mail.to),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : '',
          };
          writeFileSync(path.join(dir, `${id}.eml`), raw);
          writeFileSync(path.join(dir, `${id}.json`), JSON.stringify(record, null, 2));
          callback();
        } catch (error) {
          callback(error);
        }
      });
    },
  });
  await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', resolve);
  });
  return { port: server.server.address().port, close: () => new Promise((r) => server.close(r)) };
}
