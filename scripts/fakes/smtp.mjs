#!/usr/bin/env node
// Local SMTP fake for development and the browser e2e: smtp-server on 127.0.0.1 that parses each mail with
// mailparser and stores it as JSON under <repo>/.data/mail/<smtp-port>/, plus a small read-only inbox.
//
// Usage:
//   node scripts/fakes/smtp.mjs [--port 2525] [--web-port 2526]
//
// Defaults come from SMTP_PORT (2525) and SMTP_WEB_PORT (SMTP_PORT + 1). The inbox serves an HTML list at
// http://127.0.0.1:<web-port>/ and every stored mail at /messages.json (newest first). It prints one line
// "smtp fake ready on 127.0.0.1:<port>, inbox http://127.0.0.1:<web-port>/" and runs until SIGINT or SIGTERM.
// Nothing is relayed anywhere: every mail stays on this machine.
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';

const require = createRequire(join(resolve(dirname(fileURLToPath(import.meta.url)), '../../api'), 'package.json'));
const { SMTPServer } = require('smtp-server');
const { simpleParser } = require('mailparser');

const { values } = parseArgs({
  options: {
    port: { type: 'string', default: process.env.SMTP_PORT || '2525' },
    'web-port': { type: 'string', default: process.env.SMTP_WEB_PORT || '' },
  },
});
const port = Number(values.port);
const webPort = Number(values['web-port'] || port + 1);
for (const [name, value] of [['--port', port], ['--web-port', webPort]]) {
  if (!Number.isInteger(value) || value < 1 || value > 65535) {
    console.error(`smtp fake: ${name} must be a whole number from 1 to 65535`);
    process.exit(2);
  }
}

const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const directory = join(repoRoot, '.data', 'mail', String(port));
mkdirSync(directory, { recursive: true });

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  logger: false,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const receivedAt = new Date().toISOString();
        const record = {
          receivedAt,
          messageId: mail.messageId ?? null,
          from: mail.from?.text ?? '',
          to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          attachments: mail.attachments.map((attachment) => ({ filename: attachment.filename ?? null, size: attachment.size })),
        };
        writeFileSync(join(directory, `${receivedAt.replace(/[:.]/g, '-')}-${Math.random().toString(36).slice(2, 8)}.json`), JSON.stringify(record, null, 2));
        callback();
      })
      .catch((error) => callback(error));
  },
});

function messages() {
  return readdirSync(directory)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .reverse()
    .map((name) => JSON.parse(readFileSync(join(directory, name), 'utf8')));
}

const escapeHtml = (text) => String(text).replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]);

const web = createServer((request, response) => {
  if (request.method !== 'GET') {
    response.writeHead(405, { Allow: 'GET' }).end();
    return;
  }
  const path = new URL(request.url ?? '/', 'http://localhost').pathname;
  if (path === '/messages.json') {
    response.writeHead(200, { 'Content-Type': 'application/json; charset=utf-8', 'Cache-Control': 'no-store' }).end(JSON.stringify(messages()));
    return;
  }
  if (path !== '/') {
    response.writeHead(404, { 'Content-Type': 'text/plain; charset=utf-8' }).end('Not found');
    return;
  }
  const items = messages()
    .map((mail) => `<li><h2>${escapeHtml(mail.subject)}</h2><p>To ${escapeHtml(mail.to.join(', '))}, ${escapeHtml(mail.receivedAt)}</p><pre>${escapeHtml(mail.text)}</pre></li>`)
    .join('\n');
  response
    .writeHead(200, { 'Content-Type': 'text/html; charset=utf-8', 'Cache-Control': 'no-store', 'Content-Security-Policy': "default-src 'none'" })
    .end(
      `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Siteband local mail</title></head><body>` +
        `<h1>Mail sent by Siteband on this machine (${messages().length})</h1><p>Reload to see new mail. JSON: <a href="/messages.json">/messages.json</a></p>` +
        `<ol>${items}</ol></body></html>`,
    );
});

try {
  await new Promise((resolveListen, reject) => {
    smtp.once('error', reject);
    smtp.listen(port, '127.0.0.1', resolveListen);
  });
  await new Promise((resolveListen, reject) => {
    web.once('error', reject);
    web.listen(webPort, '127.0.0.1', resolveListen);
  });
} catch (error) {
  console.error(`smtp fake: could not start on 127.0.0.1:${port} / ${webPort}: ${error.message}`);
  process.exit(1);
}
console.log(`smtp fake ready on 127.0.0.1:${port}, inbox http://127.0.0.1:${webPort}/ (mails in ${directory})`);

let stopping = false;
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => {
    if (stopping) return;
    stopping = true;
    web.close();
    smtp.close(() => process.exit(0));
  });
}
