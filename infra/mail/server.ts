// The local mail catcher: an SMTP server on loopback that keeps every message, and a small
// web inbox (HTML for people, JSON for tests) to read them.
import { mkdirSync } from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { MessageStore } from './store';
import { renderInbox, renderMessage } from './views';

const smtpPort = Number(new URL(process.env.SMTP_URL ?? 'smtp://127.0.0.1:4125').port);
const uiPort = Number(new URL(process.env.MAIL_CATCHER_URL ?? 'http://127.0.0.1:4180').port);
const dir = path.join(process.env.DATA_DIR ?? '.data/dev', 'mail');
mkdirSync(dir, { recursive: true });
const store = new MessageStore(path.join(dir, 'messages.jsonl'));

const addresses = (field: AddressObject | AddressObject[] | undefined): string[] =>
  (Array.isArray(field) ? field : field ? [field] : [])
    .flatMap((a) => a.value.map((v) => v.address ?? ''))
    .filter(Boolean);

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  banner: 'Kerfmark local mail catcher',
  size: 25 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const envelopeTo = session.envelope.rcptTo.map((r) => r.address);
        store.add({
          from: mail.from?.text ?? '',
          to: envelopeTo.length ? envelopeTo : addresses(mail.to),
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          html: typeof mail.html === 'string' ? mail.html : null,
          messageId: mail.messageId ?? null,
        });
        callback();
      })
      .catch((error: Error) => callback(error));
  },
});
smtp.on('error', (error) => console.error(`smtp: ${error.message}`));
smtp.listen(smtpPort, '127.0.0.1');

const ui = http.createServer((req, res) => {
  const url = new URL(req.url ?? '/', `http://127.0.0.1:${uiPort}`);
  const json = (status: number, body: unknown) => {
    res.writeHead(status, { 'content-type': 'application/json' }).end(JSON.stringify(body));
  };
  if (url.pathname === '/api/messages' && req.method === 'GET') {
    return json(200, store.list({ to: url.searchParams.get('to') ?? undefined }));
  }
  if (url.pathname === '/api/messages' && req.method === 'DELETE') {
    store.clear();
    return json(200, { cleared: true });
  }
  const match = /^\/(api\/)?messages\/(\d+)$/.exec(url.pathname);
  if (match) {
    const message = store.get(Number(match[2]));
    if (!message) return json(404, { error: 'no such message' });
    if (match[1]) return json(200, message);
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' }).end(renderMessage(message));
    return;
  }
  if (url.pathname === '/') {
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' }).end(renderInbox(store.list()));
    return;
  }
  json(404, { error: 'not found' });
});
ui.listen(uiPort, '127.0.0.1', () => {
  console.log(`mail catcher: SMTP on 127.0.0.1:${smtpPort}, inbox on http://127.0.0.1:${uiPort}`);
});

const stop = () => {
  ui.close();
  smtp.close(() => process.exit(0));
};
process.once('SIGTERM', stop);
process.once('SIGINT', stop);
