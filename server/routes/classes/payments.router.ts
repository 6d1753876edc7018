import express, { Router } from 'express';
import { openRoute } from '../../lib/route';
import { verifyPaymentEvent } from '../../services/payments';
import { handlePaymentEvent } from '../../services/registrations';

/**
 * The payment provider's webhook. It reads the raw body (the signature covers the exact bytes),
 * so it is mounted before the JSON parser and needs no CSRF token: the signature stands in for it.
 * A bad signature is 400 and changes nothing; an event for an unknown session is recorded and
 * answered 200, so the provider does not retry it for days.
 */
export function paymentsRouter() {
  const r = Router();
  r.post(
    '/webhook',
    express.raw({ type: '*/*', limit: '1mb' }),
    openRoute({}, async ({ req, res }) => {
      const event = verifyPaymentEvent(req.body, req.get('stripe-signature'));
      const outcome = await handlePaymentEvent(event);
      res.json({ received: true, outcome });
    }),
  );
  return r;
}
