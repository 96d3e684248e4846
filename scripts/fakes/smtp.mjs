// The local SMTP sink: accepts every message on loopback, keeps it as files under its data folder,
// and lets any number of app servers read them over a small HTTP API (the owner's dev inbox).
import crypto from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';
import { parseMessage } from './mime.mjs';

function listen(server, port, host) {
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve(server.address().port);
    });
  });
}

function sendJson(res, status, body) {
  res.writeHead(status, { 'content-type': 'application/json' });
  res.end(JSON.stringify(body));
}

/**
 * Starts the sink. `rejectNext` (via POST /control) makes the next N messages fail with a 451, so
 * tests can watch the app retry. Returns the bound ports and a close().
 */
export async function startSmtpSink({ host = '127.0.0.1', smtpPort = 0, apiPort = 0, dir }) {
  fs.mkdirSync(dir, { recursive: true });
  const control = { rejectNext: 0, rejectAll: false };

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 25 * 1024 * 1024,
    onAuth(_auth, _session, cb) {
      cb(null, { user: 'local' });
    },
    onData(stream, session, cb) {
      const chunks = [];
      stream.on('data', (c) => chunks.push(c));
      stream.on('end', () => {
        if (control.rejectAll || control.rejectNext > 0) {
          if (control.rejectNext > 0) control.rejectNext -= 1;
          const err = new Error('Sink told to refuse this message (local test)');
          err.responseCode = 451;
          return cb(err);
        }
        const raw = Buffer.concat(chunks);
        const id = `${Date.now().toString(36)}-${crypto.randomBytes(4).toString('hex')}`;
        const parsed = parseMessage(raw);
        const record = {
          id,
          receivedAt: new Date().toISOString(),
          envelopeFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          envelopeTo: session.envelope.rcptTo.map((r) => r.address),
          from: parsed.from,
          to: parsed.to,
          subject: parsed.subject,
          messageId: parsed.messageId,
          text: parsed.text,
          html: parsed.html,
          attachments: parsed.attachments.map((a) => ({
            filename: a.filename,
            contentType: a.contentType,
            size: a.data.length,
          })),
        };
        fs.writeFileSync(path.join(dir, `${id}.eml`), raw);
        fs.writeFileSync(path.join(dir, `${id}.json`), JSON.stringify(record));
        cb(null, `Stored as ${id}`);
      });
    },
  });

  const readAll = () =>
    fs
      .readdirSync(dir)
      .filter((f) => f.endsWith('.json'))
      .map((f) => JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8')))
      .sort((a, b) => (a.receivedAt < b.receivedAt ? 1 : a.receivedAt > b.receivedAt ? -1 : 0));

  const api = http.createServer((req, res) => {
    const url = new URL(req.url, 'http://sink');
    const parts = url.pathname.split('/').filter(Boolean);
    try {
      if (req.method === 'GET' && url.pathname === '/health')
        return sendJson(res, 200, { ok: true });
      if (req.method === 'GET' && parts[0] === 'messages' && parts.length === 1) {
        const to = url.searchParams.get('to');
        let list = readAll();
        if (to) {
          const t = to.toLowerCase();
          list = list.filter((m) => m.envelopeTo.some((a) => a.toLowerCase() === t));
        }
        const limit = Math.min(Number(url.searchParams.get('limit') || 200), 1000);
        return sendJson(res, 200, {
          items: list.slice(0, limit).map((m) => ({ ...m, html: undefined })),
        });
      }
      if (parts[0] === 'messages' && parts[1] && !/^[a-z0-9-]+$/.test(parts[1]))
        return sendJson(res, 404, { error: 'no such message' });
      if (req.method === 'GET' && parts[0] === 'messages' && parts.length === 2) {
        const f = path.join(dir, `${parts[1]}.json`);
        if (!fs.existsSync(f)) return sendJson(res, 404, { error: 'no such message' });
        return sendJson(res, 200, JSON.parse(fs.readFileSync(f, 'utf8')));
      }
      if (req.method === 'GET' && parts[0] === 'messages' && parts[2] === 'attachments') {
        const f = path.join(dir, `${parts[1]}.eml`);
        if (!fs.existsSync(f)) return sendJson(res, 404, { error: 'no such message' });
        const a = parseMessage(fs.readFileSync(f)).attachments[Number(parts[3])];
        if (!a) return sendJson(res, 404, { error: 'no such attachment' });
        res.writeHead(200, {
          'content-type': a.contentType,
          'content-disposition': `attachment; filename="${a.filename.replace(/"/g, '')}"`,
        });
        return res.end(a.data);
      }
      if (req.method === 'DELETE' && url.pathname === '/messages') {
        for (const f of fs.readdirSync(dir)) fs.rmSync(path.join(dir, f), { force: true });
        return sendJson(res, 200, { ok: true });
      }
      if (req.method === 'POST' && url.pathname === '/control') {
        let body = '';
        req.on('data', (c) => (body += c));
        req.on('end', () => {
          const next = JSON.parse(body || '{}');
          if (typeof next.rejectNext === 'number') control.rejectNext = next.rejectNext;
          if (typeof next.rejectAll === 'boolean') control.rejectAll = next.rejectAll;
          sendJson(res, 200, control);
        });
        return;
      }
      sendJson(res, 404, { error: 'not found' });
    } catch (err) {
      sendJson(res, 500, { error: String(err && err.message) });
    }
  });

  const boundSmtp = await new Promise((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(smtpPort, host, () => {
      smtp.off('error', reject);
      resolve(smtp.server.address().port);
    });
  });
  smtp.on('error', (err) => process.stderr.write(`[fakes] smtp: ${err.message}\n`));
  const boundApi = await listen(api, apiPort, host);
  return {
    smtpPort: boundSmtp,
    apiPort: boundApi,
    control,
    close: () =>
      Promise.all([
        new Promise((r) => smtp.close(r)),
        new Promise((r) => {
          api.closeAllConnections?.();
          api.close(r);
        }),
      ]),
  };
}
