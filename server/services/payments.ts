import Stripe from 'stripe';
import { config } from '../config';
import { BadRequestError, UnavailableError } from '../lib/errors';

/**
 * The payment provider through its own Node SDK. With no real key in the config it points at the
 * local fake (server/fakes/payments.ts) on loopback; a real key talks to the provider itself.
 */
let client: Stripe | null = null;

export function payments(): Stripe {
  client ??= new Stripe(
    config.payments.secretKey,
    config.payments.fake
      ? { host: config.payments.host, port: config.payments.port, protocol: 'http', maxNetworkRetries: 0, telemetry: false, timeout: 15_000 }
      : { maxNetworkRetries: 2, telemetry: false },
  );
  return client;
}

export type CheckoutInput = {
  registrationId: string;
  attempt: number;
  amountCents: number;
  currency: string;
  productName: string;
  email: string;
  successUrl: string;
  cancelUrl: string;
  expiresAt: Date;
};

/** What happened at the provider, in words an attendee can read, without a stack. */
function unavailable(e: unknown): UnavailableError {
  console.error('[payments]', (e as Error).message);
  return new UnavailableError('The payment service did not answer; nothing was charged. Try again in a minute.');
}

/**
 * A hosted checkout for one registration's kit fee. The idempotency key names the registration
 * and the attempt, so a retried request never makes a second session (or a second charge).
 */
export async function createCheckout(input: CheckoutInput): Promise<{ id: string; url: string }> {
  try {
    const s = await payments().checkout.sessions.create(
      {
        mode: 'payment',
        line_items: [
          { quantity: 1, price_data: { currency: input.currency.toLowerCase(), unit_amount: input.amountCents, product_data: { name: input.productName } } },
        ],
        customer_email: input.email,
        client_reference_id: input.registrationId,
        metadata: { registrationId: input.registrationId },
        payment_intent_data: { metadata: { registrationId: input.registrationId } },
        success_url: input.successUrl,
        cancel_url: input.cancelUrl,
        expires_at: Math.floor(input.expiresAt.getTime() / 1000),
      },
      { idempotencyKey: `registration-${input.registrationId}-checkout-${input.attempt}` },
    );
    if (!s.url) throw new Error('the checkout session has no URL');
    return { id: s.id, url: s.url };
  } catch (e) {
    throw unavailable(e);
  }
}

/** The session as the provider sees it now (paid, open, expired); null when it does not answer. */
export async function retrieveCheckout(id: string): Promise<Stripe.Checkout.Session | null> {
  try {
    return await payments().checkout.sessions.retrieve(id);
  } catch (e) {
    console.error('[payments] retrieve', (e as Error).message);
    return null;
  }
}

/**
 * Closes a session so nobody can pay on it any more. Returns the session as it then is: a session
 * already paid cannot be closed, and comes back `complete` (the caller confirms instead).
 */
export async function expireCheckout(id: string): Promise<Stripe.Checkout.Session | null> {
  try {
    return await payments().checkout.sessions.expire(id);
  } catch {
    return retrieveCheckout(id);
  }
}

/** Refunds a payment in full; the key makes a repeated request refund once. */
export async function refundPayment(paymentIntentId: string, registrationId: string): Promise<{ id: string; amount: number }> {
  try {
    const r = await payments().refunds.create(
      { payment_intent: paymentIntentId, metadata: { registrationId } },
      { idempotencyKey: `registration-${registrationId}-refund` },
    );
    return { id: r.id, amount: r.amount };
  } catch (e) {
    console.error('[payments] refund', (e as Error).message);
    throw new UnavailableError('The payment service did not make the refund; nothing was changed. Try again in a minute.');
  }
}

/** Checks a webhook's signature (the provider's scheme, through its SDK); 400 when it does not match. */
export function verifyPaymentEvent(raw: unknown, signature: string | undefined): Stripe.Event {
  if (!Buffer.isBuffer(raw) || !signature) throw new BadRequestError('A payment event needs its raw body and a Stripe-Signature header; nothing was changed');
  try {
    return payments().webhooks.constructEvent(raw, signature, config.payments.webhookSecret);
  } catch {
    throw new BadRequestError('The payment event’s signature does not match; nothing was changed');
  }
}
