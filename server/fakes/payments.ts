import { createHmac, randomBytes } from 'node:crypto';
import { createServer, type Server } from 'node:http';
import express, { type Request, type Response } from 'express';
import { escapeHtml } from '../lib/html';

/**
 * A local stand-in for the payment provider's API, spoken to through its own Node SDK (`stripe`,
 * pointed here with its host/port/protocol options). It covers what Cardwright uses: Checkout
 * Sessions (create, retrieve, expire) with a hosted checkout page, refunds, idempotency keys, and
 * webhook events signed the provider's way (`Stripe-Signature: t=<unix time>,v1=<HMAC-SHA256 of
 * "t.payload" with the endpoint secret>`), retried with back-off when the app does not answer.
 *
 * The checkout page shows the amount with two buttons, Pay and Decline. Scripts and tests can
 * complete a checkout without a browser: POST the checkout URL with the form field
 * `outcome=paid` or `outcome=declined`.
 *
 * State lives in memory: the fake forgets everything when it stops, like a test-mode account
 * being reset. Not a general emulator: unknown endpoints answer the provider's 404 error shape.
 */

type Json = Record<string, unknown>;
type Session = Json & {
  id: string;
  status: 'open' | 'complete' | 'expired';
  payment_status: 'unpaid' | 'paid';
  amount_total: number;
  currency: string;
  success_url: string;
  cancel_url: string;
  metadata: Record<string, string>;
  payment_intent: string | null;
  expires_at: number;
  line_items_description: string;
  pi_metadata: Record<string, string>;
};
type PaymentIntent = Json & { id: string; amount: number; currency: string; status: string; amount_refunded: number; metadata: Record<string, string> };
type Endpoint = { id: string; url: string; secret: string };
type Event = { id: string; object: 'event'; type: string; created: number; data: { object: Json }; livemode: false; api_version: string };

export type FakePaymentsOptions = {
  port: number;
  host?: string;
  /** Where events go from the start (the app's webhook URL); more can be added through /v1/webhook_endpoints. */
  webhookUrls?: string[];
  /** The signing secret of every endpoint (the app's STRIPE_WEBHOOK_SECRET). */
  webhookSecret: string;
  /** Delivery retries after a failure: 1 s, 2 s, 4 s ... (the provider retries for days; a local run needs less). */
  retries?: number;
};

const now = () => Math.floor(Date.now() / 1000);
const newId = (prefix: string) => `${prefix}_test_${randomBytes(12).toString('hex')}`;

/** The provider's error body: `{ error: { type, message, code?, param? } }`. */
function fail(res: Response, status: number, message: string, extra: Json = {}) {
  res.status(status).json({ error: { type: status === 401 ? 'invalid_request_error' : 'invalid_request_error', message, ...extra } });
}

/** The signature header for a payload: the scheme the SDK's `webhooks.constructEvent` checks. */
export function signPayload(payload: string, secret: string, timestamp = now()): string {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

function money(amount: number, currency: string) {
  const digits = new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  return new Intl.NumberFormat('en-US', { style: 'currency', currency, minimumFractionDigits: digits }).format(amount / 10 ** digits);
}

function checkoutPage(s: Session): string {
  const open = s.status === 'open';
  const amount = money(s.amount_total, s.currency.toUpperCase());
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Test checkout · ${escapeHtml(amount)}</title>
<style>body{font-family:system-ui,sans-serif;background:#f4f4f5;color:#18181b;margin:0;padding:24px}main{max-width:420px;margin:40px auto;background:#fff;border:1px solid #d4d4d8;border-radius:10px;padding:24px}
h1{font-size:20px;margin:0 0 4px}.amount{font-size:32px;font-weight:700;margin:16px 0}.note{color:#52525b;font-size:14px}
button{font:inherit;padding:10px 16px;border-radius:8px;border:1px solid #3f3f46;margin-right:8px;cursor:pointer}button.pay{background:#18181b;color:#fff}
.banner{background:#fef3c7;border:1px solid #d97706;border-radius:6px;padding:6px 10px;font-size:13px}</style></head>
<body><main><p class="banner">Local test checkout: no real card is charged.</p>
<h1>${escapeHtml(s.line_items_description || 'Payment')}</h1>
${s.customer_email ? `<p class="note">For ${escapeHtml(String(s.customer_email))}</p>` : ''}
<p class="amount" aria-label="Amount to pay">${escapeHtml(amount)}</p>
${
  open
    ? `<form method="post"><button class="pay" name="outcome" value="paid">Pay ${escapeHtml(amount)}</button><button name="outcome" value="declined">Decline (test a declined card)</button></form>`
    : `<p role="status">This checkout is ${s.status === 'complete' ? 'already paid' : 'closed'}.</p><p><a href="${escapeHtml(s.status === 'complete' ? s.success_url : s.cancel_url)}">Go back</a></p>`
}
</main></body></html>`;
}

/** Starts the fake on loopback; resolves once it listens. */
export async function startFakePayments(opts: FakePaymentsOptions) {
  const host = opts.host ?? '127.0.0.1';
  const base = `http://${host}:${opts.port}`;
  const sessions = new Map<string, Session>();
  const intents = new Map<string, PaymentIntent>();
  const refunds = new Map<string, Json>();
  const events: Event[] = [];
  const endpoints: Endpoint[] = (opts.webhookUrls ?? []).map((url) => ({ id: newId('we'), url, secret: opts.webhookSecret }));
  const idempotent = new Map<string, { params: string; status: number; body: unknown }>();
  const timers = new Set<NodeJS.Timeout>();
  const retries = opts.retries ?? 6;

  async function deliverTo(endpoint: Endpoint, event: Event, attempt: number): Promise<boolean> {
    const payload = JSON.stringify(event, null, 2);
    let ok: boolean;
    try {
      const r = await fetch(endpoint.url, {
        method: 'POST',
        headers: { 'content-type': 'application/json; charset=utf-8', 'stripe-signature': signPayload(payload, endpoint.secret) },
        body: payload,
        signal: AbortSignal.timeout(10_000),
      });
      ok = r.ok;
      await r.arrayBuffer().catch(() => undefined);
    } catch {
      ok = false;
    }
    if (!ok && attempt < retries && endpoints.includes(endpoint)) {
      const t = setTimeout(
        () => {
          timers.delete(t);
          void deliverTo(endpoint, event, attempt + 1);
        },
        1000 * 2 ** attempt,
      );
      t.unref();
      timers.add(t);
    }
    return ok;
  }

  /** Records an event and sends it to every endpoint; waits for the first attempt so scripts see its effect. */
  async function emit(type: string, object: Json): Promise<Event> {
    const event: Event = {
      id: newId('evt'),
      object: 'event',
      type,
      created: now(),
      data: { object: structuredClone(object) },
      livemode: false,
      api_version: '2026-10-28',
    };
    events.push(event);
    await Promise.all(endpoints.map((e) => deliverTo(e, event, 0)));
    return event;
  }

  const app = express();
  app.disable('x-powered-by');
  // One request a connection: clients never reuse a socket the fake is about to close.
  app.use((_req, res, next) => {
    res.setHeader('connection', 'close');
    next();
  });
  app.use(express.urlencoded({ extended: true, limit: '1mb' }));

  // The hosted checkout page and its two buttons.
  app.get('/checkout/:id', (req, res) => {
    const s = sessions.get(req.params.id);
    if (!s) return void res.status(404).type('html').send('<!doctype html><title>Not found</title><p>No such checkout.</p>');
    res.type('html').send(checkoutPage(s));
  });
  app.post('/checkout/:id', async (req, res) => {
    const s = sessions.get(req.params.id);
    if (!s) return void fail(res, 404, `No such checkout.session: '${req.params.id}'`, { code: 'resource_missing' });
    const outcome = (req.body as Json)?.outcome;
    if (outcome !== 'paid' && outcome !== 'declined') return void fail(res, 400, 'Send outcome=paid or outcome=declined', { param: 'outcome' });
    if (s.expires_at <= now() && s.status === 'open') {
      s.status = 'expired';
      await emit('checkout.session.expired', s);
    }
    if (s.status !== 'open')
      return void fail(res, 409, `This checkout is ${s.status === 'complete' ? 'already paid' : 'expired'}`, { code: 'checkout_not_open' });
    const pi: PaymentIntent = {
      id: newId('pi'),
      object: 'payment_intent',
      amount: s.amount_total,
      currency: s.currency,
      status: outcome === 'paid' ? 'succeeded' : 'requires_payment_method',
      amount_refunded: 0,
      metadata: s.pi_metadata,
      created: now(),
      ...(outcome === 'declined'
        ? { last_payment_error: { type: 'card_error', code: 'card_declined', decline_code: 'generic_decline', message: 'Your card was declined.' } }
        : {}),
    };
    intents.set(pi.id, pi);
    if (outcome === 'paid') {
      s.status = 'complete';
      s.payment_status = 'paid';
      s.payment_intent = pi.id;
      await emit('checkout.session.completed', s);
      return void res.redirect(303, s.success_url.replace('{CHECKOUT_SESSION_ID}', s.id));
    }
    // A declined card leaves the session open at the provider; the app decides what to do (it releases the seat).
    await emit('payment_intent.payment_failed', { ...pi, checkout_session: s.id });
    res.redirect(303, s.cancel_url.replace('{CHECKOUT_SESSION_ID}', s.id));
  });

  // Test helpers: the events sent, and sending one again (a duplicate delivery).
  app.get('/__fake/events', (_req, res) => void res.json({ data: events }));
  app.post('/__fake/events/:id/resend', async (req, res) => {
    const e = events.find((x) => x.id === req.params.id);
    if (!e) return void fail(res, 404, 'No such event');
    const results = await Promise.all(endpoints.map((ep) => deliverTo(ep, e, retries)));
    res.json({ delivered: results.filter(Boolean).length });
  });

  const api = express.Router();
  api.use((req, res, next) => {
    const auth = req.get('authorization') ?? '';
    if (!/^Bearer sk_(test|live)_\S+$/.test(auth)) return void fail(res, 401, 'Invalid API Key provided');
    next();
  });
  // Idempotency: the same key with the same parameters answers the first result again; other parameters are an error.
  api.use((req, res, next) => {
    const key = req.get('idempotency-key');
    if (req.method !== 'POST' || !key) return next();
    const params = JSON.stringify({ path: req.path, body: req.body });
    const seen = idempotent.get(key);
    if (seen) {
      if (seen.params !== params)
        return void res.status(400).json({
          error: { type: 'idempotency_error', message: 'Keys for idempotent requests can only be used with the same parameters they were first used with.' },
        });
      res.setHeader('idempotent-replayed', 'true');
      return void res.status(seen.status).json(seen.body);
    }
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      idempotent.set(key, { params, status: res.statusCode, body });
      return json(body);
    };
    next();
  });

  api.post('/checkout/sessions', (req: Request, res: Response) => {
    const b = (req.body ?? {}) as Json;
    if (b.mode !== 'payment') return void fail(res, 400, 'Only mode=payment is supported here', { param: 'mode' });
    for (const p of ['success_url', 'cancel_url'] as const)
      if (typeof b[p] !== 'string' || !/^https?:\/\//.test(b[p] as string)) return void fail(res, 400, `Missing required param: ${p}.`, { param: p });
    const items = Array.isArray(b.line_items) ? (b.line_items as Json[]) : [];
    if (!items.length) return void fail(res, 400, 'Missing required param: line_items.', { param: 'line_items' });
    let total = 0;
    let currency = '';
    const names: string[] = [];
    for (const [i, item] of items.entries()) {
      const pd = (item.price_data ?? {}) as Json;
      const amount = Number(pd.unit_amount);
      const qty = Number(item.quantity ?? 1);
      if (!Number.isInteger(amount) || amount < 0)
        return void fail(res, 400, 'unit_amount must be a whole number of minor units', { param: `line_items[${i}][price_data][unit_amount]` });
      if (!Number.isInteger(qty) || qty < 1) return void fail(res, 400, 'quantity must be at least 1', { param: `line_items[${i}][quantity]` });
      if (typeof pd.currency !== 'string' || !/^[a-z]{3}$/.test(pd.currency))
        return void fail(res, 400, 'Invalid currency', { param: `line_items[${i}][price_data][currency]` });
      if (currency && pd.currency !== currency) return void fail(res, 400, 'All line items must use the same currency');
      currency = pd.currency;
      total += amount * qty;
      names.push(String(((pd.product_data ?? {}) as Json).name ?? 'Item'));
    }
    // The provider's window for expires_at: 30 minutes to 24 hours from now.
    let expires = now() + 24 * 3600;
    if (b.expires_at !== undefined) {
      expires = Number(b.expires_at);
      if (!Number.isInteger(expires) || expires < now() + 30 * 60 - 5 || expires > now() + 24 * 3600 + 5)
        return void fail(res, 400, 'expires_at must be between 30 minutes and 24 hours from now', { param: 'expires_at' });
    }
    const id = newId('cs');
    const s: Session = {
      id,
      object: 'checkout.session',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: total,
      amount_subtotal: total,
      currency,
      customer_email: typeof b.customer_email === 'string' ? b.customer_email : null,
      client_reference_id: typeof b.client_reference_id === 'string' ? b.client_reference_id : null,
      metadata: (b.metadata ?? {}) as Record<string, string>,
      success_url: b.success_url as string,
      cancel_url: b.cancel_url as string,
      url: `${base}/checkout/${id}`,
      payment_intent: null,
      expires_at: expires,
      created: now(),
      livemode: false,
      line_items_description: names.join(', '),
      pi_metadata: ((b.payment_intent_data as Json | undefined)?.metadata ?? {}) as Record<string, string>,
    };
    sessions.set(id, s);
    res.json(s);
  });

  api.get('/checkout/sessions/:id', (req, res) => {
    const s = sessions.get(req.params.id);
    if (!s) return void fail(res, 404, `No such checkout.session: '${req.params.id}'`, { code: 'resource_missing', param: 'session' });
    if (s.status === 'open' && s.expires_at <= now()) s.status = 'expired';
    res.json(s);
  });

  api.post('/checkout/sessions/:id/expire', async (req, res) => {
    const s = sessions.get(req.params.id);
    if (!s) return void fail(res, 404, `No such checkout.session: '${req.params.id}'`, { code: 'resource_missing' });
    if (s.status === 'complete')
      return void fail(res, 400, 'This Checkout Session is already complete and cannot be expired.', { code: 'checkout_session_complete' });
    if (s.status === 'open') {
      s.status = 'expired';
      await emit('checkout.session.expired', s);
    }
    res.json(s);
  });

  api.post('/refunds', async (req, res) => {
    const b = (req.body ?? {}) as Json;
    const pi = typeof b.payment_intent === 'string' ? intents.get(b.payment_intent) : undefined;
    if (!pi) return void fail(res, 404, `No such payment_intent: '${String(b.payment_intent)}'`, { code: 'resource_missing', param: 'payment_intent' });
    if (pi.status !== 'succeeded') return void fail(res, 400, 'This PaymentIntent has not succeeded, so there is nothing to refund.');
    const amount = b.amount === undefined ? pi.amount - pi.amount_refunded : Number(b.amount);
    if (!Number.isInteger(amount) || amount <= 0 || amount > pi.amount - pi.amount_refunded)
      return void fail(res, 400, `Refund amount (${amount}) is greater than what is left to refund`, { code: 'amount_too_large', param: 'amount' });
    pi.amount_refunded += amount;
    const refund = {
      id: newId('re'),
      object: 'refund',
      amount,
      currency: pi.currency,
      payment_intent: pi.id,
      status: 'succeeded',
      metadata: (b.metadata ?? {}) as Json,
      created: now(),
    };
    refunds.set(refund.id, refund);
    await emit('refund.created', refund);
    res.json(refund);
  });

  api.get('/refunds/:id', (req, res) => {
    const r = refunds.get(req.params.id);
    if (!r) return void fail(res, 404, `No such refund: '${req.params.id}'`, { code: 'resource_missing' });
    res.json(r);
  });

  api.post('/webhook_endpoints', (req, res) => {
    const url = (req.body as Json)?.url;
    if (typeof url !== 'string' || !/^https?:\/\//.test(url)) return void fail(res, 400, 'Missing required param: url.', { param: 'url' });
    const e: Endpoint = { id: newId('we'), url, secret: opts.webhookSecret };
    endpoints.push(e);
    res.json({ id: e.id, object: 'webhook_endpoint', url: e.url, secret: e.secret, status: 'enabled' });
  });
  api.delete('/webhook_endpoints/:id', (req, res) => {
    const i = endpoints.findIndex((e) => e.id === req.params.id);
    if (i < 0) return void fail(res, 404, `No such webhook endpoint: '${req.params.id}'`, { code: 'resource_missing' });
    endpoints.splice(i, 1);
    res.json({ id: req.params.id, object: 'webhook_endpoint', deleted: true });
  });

  app.use('/v1', api);
  app.use((_req, res) => fail(res, 404, 'Unrecognized request URL. This local stand-in covers checkout sessions, refunds and webhook endpoints.'));

  const server: Server = createServer(app);
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port, host, () => resolve());
  });
  return {
    port: opts.port,
    url: base,
    async close() {
      for (const t of timers) clearTimeout(t);
      server.closeAllConnections();
      await new Promise<void>((r) => server.close(() => r()));
    },
  };
}
