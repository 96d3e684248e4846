// A small MIME reader for the SMTP sink: enough for what nodemailer writes (headers, multipart,
// base64 and quoted-printable parts, attachments). Not a general mail parser.

function splitHeadBody(buf) {
  const s = buf.toString('latin1');
  let i = s.indexOf('\r\n\r\n');
  let sep = 4;
  if (i < 0) {
    i = s.indexOf('\n\n');
    sep = 2;
  }
  if (i < 0) return { head: s, body: Buffer.alloc(0) };
  return { head: s.slice(0, i), body: buf.subarray(i + sep) };
}

function decodeWords(value) {
  // RFC 2047 encoded words: =?charset?B|Q?text?=
  return value.replace(/=\?([^?]+)\?([bqBQ])\?([^?]*)\?=/g, (_m, _cs, enc, text) => {
    if (enc.toUpperCase() === 'B') return Buffer.from(text, 'base64').toString('utf8');
    const bytes = text
      .replace(/_/g, ' ')
      .replace(/=([0-9A-Fa-f]{2})/g, (_x, h) => String.fromCharCode(parseInt(h, 16)));
    return Buffer.from(bytes, 'latin1').toString('utf8');
  });
}

/** Parses header lines (with folding) into a lower-cased map; repeated headers keep the first. */
export function parseHeaders(head) {
  const out = {};
  const lines = head.replace(/\r\n/g, '\n').split('\n');
  let current = null;
  for (const line of lines) {
    if (/^[ \t]/.test(line) && current) {
      out[current] += ' ' + line.trim();
      continue;
    }
    const m = /^([^:]+):\s*(.*)$/.exec(line);
    if (!m) continue;
    current = m[1].trim().toLowerCase();
    if (out[current] === undefined) out[current] = m[2];
    else current = `${current}#dup`;
  }
  for (const k of Object.keys(out)) out[k] = decodeWords(out[k]);
  return out;
}

function param(header, name) {
  if (!header) return undefined;
  const re = new RegExp(`${name}\\*?=("([^"]*)"|([^;\\s]+))`, 'i');
  const m = re.exec(header);
  if (!m) return undefined;
  const v = m[2] ?? m[3];
  return v.startsWith("utf-8''") ? decodeURIComponent(v.slice(7)) : v;
}

function decodeBody(body, encoding) {
  const enc = (encoding || '7bit').toLowerCase().trim();
  if (enc === 'base64') return Buffer.from(body.toString('latin1').replace(/\s+/g, ''), 'base64');
  if (enc === 'quoted-printable') {
    const s = body
      .toString('latin1')
      .replace(/=\r?\n/g, '')
      .replace(/=([0-9A-Fa-f]{2})/g, (_x, h) => String.fromCharCode(parseInt(h, 16)));
    return Buffer.from(s, 'latin1');
  }
  return body;
}

function walk(buf, acc) {
  const { head, body } = splitHeadBody(buf);
  const headers = parseHeaders(head);
  const type = (headers['content-type'] || 'text/plain').split(';')[0].trim().toLowerCase();
  if (type.startsWith('multipart/')) {
    const boundary = param(headers['content-type'], 'boundary');
    if (!boundary) return headers;
    const text = body.toString('latin1');
    const parts = text.split(`--${boundary}`);
    for (const part of parts.slice(1)) {
      if (part.startsWith('--')) break;
      const trimmed = part.replace(/^\r?\n/, '').replace(/\r?\n$/, '');
      walk(Buffer.from(trimmed, 'latin1'), acc);
    }
    return headers;
  }
  const data = decodeBody(body, headers['content-transfer-encoding']);
  const disposition = headers['content-disposition'] || '';
  const filename = param(disposition, 'filename') || param(headers['content-type'], 'name');
  if (disposition.toLowerCase().startsWith('attachment') || filename) {
    acc.attachments.push({ filename: filename || 'attachment', contentType: type, data });
  } else if (type === 'text/plain' && acc.text === undefined) {
    acc.text = data.toString('utf8');
  } else if (type === 'text/html' && acc.html === undefined) {
    acc.html = data.toString('utf8');
  }
  return headers;
}

/** Reads a raw message into { headers, subject, from, to, text, html, attachments[{filename, contentType, data}] }. */
export function parseMessage(raw) {
  const acc = { text: undefined, html: undefined, attachments: [] };
  const headers = walk(raw, acc);
  return {
    headers,
    subject: headers.subject ?? '',
    from: headers.from ?? '',
    to: headers.to ?? '',
    messageId: headers['message-id'] ?? '',
    text: acc.text ?? '',
    html: acc.html ?? '',
    attachments: acc.attachments,
  };
}
