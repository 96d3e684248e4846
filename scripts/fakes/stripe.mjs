// A local fake of the few Stripe endpoints the app calls: create and read a Checkout Session, plus
// a pay page that completes the session and delivers a signed `checkout.session.completed` webhook
// (signed the way `stripe.webhooks.constructEvent` verifies). Sessions persist as JSON files.
import crypto from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import Stripe from 'stripe';

const signer = new Stripe('sk_test_signer_only');

/** Reads `a[b][0][c]=v` form bodies (what the Stripe SDK sends) into nested objects and arrays. */
export function parseStripeForm(body) {
  const out = {};
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const keys = rawKey.replace(/\]/g, '').split('[');
    let node = out;
    keys.forEach((k, i) => {
      const last = i === keys.length - 1;
      const nextIsIndex = !last && /^\d+$/.test(keys[i + 1]);
      if (last) node[k] = value;
      else {
        if (node[k] === undefined) node[k] = nextIsIndex ? [] : {};
        node = node[k];
      }
    });
  }
  return out;
}

function readBody(req) {
  return new Promise((resolve, reject) => {
    const chunks = [];
    req.on('data', (c) => chunks.push(c));
    req.on('end', () => resolve(Buffer.concat(chunks).toString('utf8')));
    req.on('error', reject);
  });
}

function json(res, status, body) {
  res.writeHead(status, { 'content-type': 'application/json' });
  res.end(JSON.stringify(body));
}

function stripeError(res, status, message, param) {
  json(res, status, { error: { type: 'invalid_request_error', message, param } });
}

const escapeHtml = (s) =>
  String(s).replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c],
  );

/**
 * Starts the fake. Webhooks go to `webhookUrl` when given, otherwise to the origin of the
 * session's success_url + /api/webhooks/stripe (so several app servers can share one fake).
 */
export async function startStripeFake({
  host = '127.0.0.1',
  port = 0,
  dir,
  webhookSecret,
  webhookUrl,
}) {
  fs.mkdirSync(dir, { recursive: true });
  const sessions = new Map();
  const file = (id) => path.join(dir, `${id}.json`);
  const load = (id) => {
    if (sessions.has(id)) return sessions.get(id);
    if (!/^cs_test_[A-Za-z0-9]+$/.test(id) || !fs.existsSync(file(id))) return undefined;
    const s = JSON.parse(fs.readFileSync(file(id), 'utf8'));
    sessions.set(id, s);
    return s;
  };
  const save = (s) => {
    sessions.set(s.session.id, s);
    fs.writeFileSync(file(s.session.id), JSON.stringify(s));
  };
  let base = '';

  function targetFor(session) {
    if (webhookUrl) return webhookUrl;
    return new URL('/api/webhooks/stripe', session.success_url).toString();
  }

  async function deliver(entry) {
    const payload = JSON.stringify(entry.event);
    const header = signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    const res = await fetch(targetFor(entry.session), {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'stripe-signature': header },
      body: payload,
    });
    const text = await res.text();
    entry.deliveries.push({ at: new Date().toISOString(), status: res.status });
    save(entry);
    return { status: res.status, body: text };
  }

  async function pay(entry) {
    if (entry.session.status === 'complete') return deliver(entry);
    entry.session.status = 'complete';
    entry.session.payment_status = 'paid';
    entry.session.payment_intent = `pi_test_${crypto.randomBytes(12).toString('hex')}`;
    entry.event = {
      id: `evt_test_${crypto.randomBytes(12).toString('hex')}`,
      object: 'event',
      api_version: '2024-06-20',
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      pending_webhooks: 1,
      type: 'checkout.session.completed',
      data: { object: entry.session },
    };
    save(entry);
    // Retried a few times, as the real service retries failed deliveries.
    let last;
    for (let i = 0; i < 3; i += 1) {
      try {
        last = await deliver(entry);
        if (last.status >= 200 && last.status < 300) return last;
      } catch (err) {
        last = { status: 0, body: String(err.message) };
      }
      await new Promise((r) => setTimeout(r, 200 * (i + 1)));
    }
    return last;
  }

  const server = http.createServer(async (req, res) => {
    const url = new URL(req.url, 'http://fake');
    const parts = url.pathname.split('/').filter(Boolean);
    try {
      if (url.pathname === '/health') return json(res, 200, { ok: true });

      if (parts[0] === 'v1') {
        const auth = req.headers.authorization || '';
        if (!/^Bearer sk_test_/.test(auth))
          return json(res, 401, {
            error: { type: 'invalid_request_error', message: 'Invalid API Key provided' },
          });
        if (req.method === 'POST' && url.pathname === '/v1/checkout/sessions') {
          const p = parseStripeForm(await readBody(req));
          if (!p.success_url) return stripeError(res, 400, 'Missing success_url', 'success_url');
          if (p.mode !== 'payment') return stripeError(res, 400, 'Only mode=payment', 'mode');
          const items = Array.isArray(p.line_items) ? p.line_items : [];
          if (items.length === 0) return stripeError(res, 400, 'Missing line_items', 'line_items');
          let amount = 0;
          let currency;
          for (const it of items) {
            const unit = Number(it.price_data?.unit_amount);
            const qty = Number(it.quantity ?? 1);
            if (!Number.isInteger(unit) || unit < 0)
              return stripeError(res, 400, 'Bad unit_amount', 'line_items');
            amount += unit * qty;
            currency = it.price_data?.currency;
          }
          const id = `cs_test_${crypto.randomBytes(16).toString('hex')}`;
          const now = Math.floor(Date.now() / 1000);
          const session = {
            id,
            object: 'checkout.session',
            mode: 'payment',
            status: 'open',
            payment_status: 'unpaid',
            amount_total: amount,
            amount_subtotal: amount,
            currency: (currency || 'gbp').toLowerCase(),
            client_reference_id: p.client_reference_id ?? null,
            customer_email: p.customer_email ?? null,
            metadata: p.metadata ?? {},
            success_url: p.success_url,
            cancel_url: p.cancel_url ?? null,
            payment_intent: null,
            created: now,
            expires_at: now + 24 * 3600,
            livemode: false,
            url: `${base}/pay/${id}`,
            line_items_description: items.map((it) => it.price_data?.product_data?.name ?? ''),
          };
          save({ session, event: null, deliveries: [] });
          return json(res, 200, session);
        }
        if (
          req.method === 'GET' &&
          parts[1] === 'checkout' &&
          parts[2] === 'sessions' &&
          parts[3]
        ) {
          const e = load(parts[3]);
          if (!e) return stripeError(res, 404, `No such checkout.session: '${parts[3]}'`, 'id');
          return json(res, 200, e.session);
        }
        return stripeError(res, 404, `Unrecognized request URL (${req.method}: ${url.pathname})`);
      }

      if (parts[0] === 'pay' && parts[1]) {
        const e = load(parts[1]);
        if (!e) {
          res.writeHead(404, { 'content-type': 'text/html' });
          return res.end('<!doctype html><title>Not found</title><p>No such payment page.</p>');
        }
        if (req.method === 'POST') {
          const form = new URLSearchParams(await readBody(req));
          if (form.get('action') === 'cancel' && e.session.cancel_url) {
            res.writeHead(303, { location: e.session.cancel_url });
            return res.end();
          }
          await pay(e);
          res.writeHead(303, {
            location: e.session.success_url.replace('{CHECKOUT_SESSION_ID}', e.session.id),
          });
          return res.end();
        }
        const amount = (e.session.amount_total / 100).toFixed(2);
        res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
        return res.end(`<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width,initial-scale=1"><title>Test payment</title>
<style>body{font-family:system-ui,sans-serif;max-width:32rem;margin:3rem auto;padding:0 1rem}
button{font-size:1.1rem;padding:.6rem 1.2rem;margin-right:.5rem}</style></head><body>
<p><strong>Local test payment service</strong> — no money moves.</p>
<h1>Pay ${escapeHtml(e.session.currency.toUpperCase())} ${escapeHtml(amount)}</h1>
<p>${e.session.line_items_description.map(escapeHtml).join('<br>')}</p>
<p>Status: ${escapeHtml(e.session.payment_status)}</p>
<form method="post"><button name="action" value="pay" type="submit">Pay now (test card)</button>
<button name="action" value="cancel" type="submit">Cancel</button></form></body></html>`);
      }

      // Test hooks: pay without a browser, and deliver the same event again (duplicate delivery).
      if (req.method === 'POST' && parts[0] === '_fake' && parts[1] === 'sessions' && parts[2]) {
        const e = load(parts[2]);
        if (!e) return json(res, 404, { error: 'no such session' });
        if (parts[3] === 'pay') return json(res, 200, await pay(e));
        if (parts[3] === 'deliver') {
          if (!e.event) return json(res, 409, { error: 'session not paid yet' });
          return json(res, 200, await deliver(e));
        }
      }
      json(res, 404, { error: 'not found' });
    } catch (err) {
      json(res, 500, { error: { type: 'api_error', message: String(err && err.message) } });
    }
  });

  const bound = await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve(server.address().port);
    });
  });
  base = `http://${host}:${bound}`;
  return {
    port: bound,
    url: base,
    close: () =>
      new Promise((r) => {
        server.closeAllConnections?.();
        server.close(r);
      }),
  };
}
