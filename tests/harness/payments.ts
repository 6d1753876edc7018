import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll } from 'vitest';
import type { Express } from 'express';
import { config } from '@server/config';
import { payments } from '@server/services/payments';

/**
 * Serves the test's app on a loopback port and tells the fake payment server to send its webhook
 * events there (the provider's webhook endpoints API), as a deployed app would be reached.
 * `stop()` and `start()` take the app down and up on the same port (a restart).
 */
export async function serveForWebhooks(app: Express) {
  let server: Server = createServer(app);
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const port = (server.address() as AddressInfo).port;
  const endpoint = await payments().webhookEndpoints.create({ url: `http://127.0.0.1:${port}/api/payments/webhook`, enabled_events: ['*'] });
  const stop = async () => {
    server.closeAllConnections();
    await new Promise<void>((r) => server.close(() => r()));
  };
  afterAll(async () => {
    await payments()
      .webhookEndpoints.del(endpoint.id)
      .catch(() => undefined);
    if (server.listening) await stop();
  });
  return {
    port,
    stop,
    async start() {
      server = createServer(app);
      await new Promise<void>((r) => server.listen(port, '127.0.0.1', r));
    },
  };
}

/** Completes a checkout without a browser, as scripts do: POST the checkout URL with outcome=paid|declined. */
export async function completeCheckout(checkoutUrl: string, outcome: 'paid' | 'declined') {
  const r = await fetch(checkoutUrl, { method: 'POST', body: new URLSearchParams({ outcome }), redirect: 'manual' });
  return { status: r.status, location: r.headers.get('location') };
}

/** The fake's record of the events it sent (for sending one again). */
export async function fakeEvents(): Promise<{ id: string; type: string; data: { object: Record<string, unknown> } }[]> {
  const r = await fetch(`http://${config.payments.host}:${config.payments.port}/__fake/events`);
  return ((await r.json()) as { data: { id: string; type: string; data: { object: Record<string, unknown> } }[] }).data;
}

/** Sends an event again, as the provider does when it is not sure the first delivery arrived. */
export async function resendEvent(id: string) {
  const r = await fetch(`http://${config.payments.host}:${config.payments.port}/__fake/events/${id}/resend`, { method: 'POST' });
  return (await r.json()) as { delivered: number };
}
