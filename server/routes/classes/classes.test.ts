import { describe, expect, it } from 'vitest';
import ICAL from 'ical.js';
import { Material, PieceRow, Registration, Tutorial } from '@server/models';
import { config } from '@server/config';
import { testApp } from '../../../tests/harness/app';
import { TestClient } from '../../../tests/harness/client';
import { makeStudio, type StudioFixture } from '../../../tests/harness/factories';
import { mailsTo, mailTo, parsed } from '../../../tests/harness/mail';
import { completeCheckout, fakeEvents, resendEvent, serveForWebhooks } from '../../../tests/harness/payments';
import { signPayload } from '@server/fakes/payments';
import { registrationToken } from '@server/services/registration-token';
import { expireHold } from '@server/services/registrations';

const app = testApp();
const hook = await serveForWebhooks(app);

const inDays = (d: number) => new Date(Date.now() + d * 86_400_000);
/** ISO 8601 with an offset, as outside tools send it (-05:00). */
const withOffset = (d: Date) => {
  const local = new Date(d.getTime() - 5 * 3600_000).toISOString().replace(/\.\d{3}Z$/, '');
  return `${local}-05:00`;
};
const classBody = (over: Record<string, unknown> = {}) => ({
  startsAt: withOffset(inDays(10)),
  durationMinutes: 90,
  place: 'Juniper Lane back room, 12 Elm St',
  seats: 2,
  kitFeeCents: 1500,
  currency: 'USD',
  ...over,
});
const email = (name: string) => `${name.toLowerCase().replace(/[^a-z0-9]+/g, '-')}-${crypto.randomUUID().slice(0, 8)}@attendee.example`;

async function schedule(f: StudioFixture, over: Record<string, unknown> = {}) {
  const c = await f.clientFor('coordinator');
  const res = await c.post(`/api/tutorials/${f.tutorial.id}/classes`, classBody(over));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.id as string;
}

async function registerAs(classId: string, name: string, address = email(name)) {
  const visitor = new TestClient(app);
  const res = await visitor.post(`/api/classes/${classId}/registrations`, { name, email: address });
  return { res, email: address, visitor };
}

const statusOf = async (id: string) => (await Registration.findByPk(id))!.status;

describe('POST /api/tutorials/:id/classes', () => {
  it('401 signed out, 400 bad input with every issue, 403 for a student, 201 for the maker with the class id at the top level', async () => {
    const f = await makeStudio(app);
    const url = `/api/tutorials/${f.tutorial.id}/classes`;
    expect((await (await f.clientFor('anonymous')).post(url, classBody())).status).toBe(401);
    const bad = await (
      await f.clientFor('coordinator')
    ).post(url, { ...classBody(), startsAt: '2027-03-14 18:30', seats: 0, kitFeeCents: 12.5, currency: 'dollars' });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path).sort()).toEqual(['currency', 'kitFeeCents', 'seats', 'startsAt']);
    expect((await (await f.clientFor('student')).post(url, classBody())).status).toBe(403);
    const past = await (await f.clientFor('maker')).post(url, classBody({ startsAt: '2020-01-01T10:00:00+00:00' }));
    expect(past.status).toBe(409);
    expect(past.body.error).toMatch(/in the past/);
    const ok = await (await f.clientFor('maker')).post(url, classBody({ timeZone: 'America/Chicago' }));
    expect(ok.status).toBe(201);
    expect(ok.body.id).toMatch(/[0-9a-f-]{36}/);
    expect(ok.body).toMatchObject({ seats: 2, seatsTaken: 0, kitFeeCents: 1500, currency: 'USD', fee: '$15.00', title: 'Test tutorial', registrations: [] });
    // The default cautions: blades always, the children line and the deferral (common practice wording).
    expect(ok.body.cautions.join(' ')).toMatch(/blade/i);
    expect(ok.body.cautions.at(-1)).toMatch(/venue’s rules and the teacher’s judgement/);
  });

  it('the public page reads without an account; the roster does not', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f);
    const visitor = new TestClient(app);
    const pub = await visitor.get(`/api/public/classes/${f.studio.slug}/${id}`);
    expect(pub.status).toBe(200);
    expect(pub.body).toMatchObject({ id, seatsLeft: 2, registration: { state: 'open' } });
    expect(pub.body.registrations).toBeUndefined();
    expect((await visitor.get(`/api/public/classes/other-studio/${id}`)).status).toBe(404);
    expect((await visitor.get(`/api/classes/${id}`)).status).toBe(401);
    expect((await (await f.clientFor('student')).get(`/api/classes/${id}`)).status).toBe(403);
    expect((await (await f.clientFor('outsider')).get(`/api/classes/${id}`)).status).toBe(404);
  });
});

describe('registration and payment', () => {
  it('paid: 201 awaiting_payment with a checkout, the signed webhook confirms once, the confirmation carries the handout PDF and a valid .ics', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f, { whatToBring: 'A bone folder' });
    const visitor = new TestClient(app);
    expect((await visitor.post(`/api/classes/${id}/registrations`, { name: '', email: 'nope' })).status).toBe(400);
    const { res, email: address } = await registerAs(id, 'Ada');
    expect(res.status).toBe(201);
    expect(res.body.status).toBe('awaiting_payment');
    expect(res.body.checkoutUrl).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:${config.payments.port}/checkout/cs_test_`));
    const regId = res.body.id as string;
    const reg = (await Registration.findByPk(regId))!;
    // Money in minor units: 1500 cents is $15.00 (ISO 4217: USD has 2 decimal places).
    expect(reg.amountCents).toBe(1500);
    expect(reg.holdExpiresAt!.getTime() - Date.now()).toBeGreaterThan(29 * 60_000);

    // The fake's checkout page shows the amount and two buttons.
    const page = await (await fetch(res.body.checkoutUrl)).text();
    expect(page).toContain('$15.00');
    expect(page).toMatch(/value="paid"/);
    expect(page).toMatch(/value="declined"/);

    const done = await completeCheckout(res.body.checkoutUrl, 'paid');
    expect(done.status).toBe(303);
    expect(done.location).toContain(`/r/${regId}?token=`);
    expect(await statusOf(regId)).toBe('confirmed');

    // The same event delivered again changes nothing and mails nothing twice.
    const completed = (await fakeEvents()).find((e) => e.type === 'checkout.session.completed' && e.data.object.id === reg.checkoutSessionId)!;
    expect((await resendEvent(completed.id)).delivered).toBeGreaterThan(0);
    expect(await statusOf(regId)).toBe('confirmed');

    const mail = await mailTo(address, /^You’re in/);
    const m = await parsed(mail);
    const pdf = m.attachments.find((a) => a.contentType === 'application/pdf')!;
    // PDF header "%PDF-" (ISO 32000-1, 7.5.2); Letter is 612 x 792 pt (PDF reference).
    expect(pdf.content.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdf.content.toString('latin1')).toMatch(/\/MediaBox \[0 0 612 792\]/);
    const ics = m.attachments.find((a) => a.filename?.endsWith('.ics'))!;
    // RFC 5545, parsed back by ical.js: one VEVENT at the class's start, 90 minutes long, at its place.
    const cal = new ICAL.Component(ICAL.parse(ics.content.toString('utf8')));
    expect(cal.name).toBe('vcalendar');
    expect(cal.getFirstPropertyValue('method')).toBe('PUBLISH');
    const ev = new ICAL.Event(cal.getFirstSubcomponent('vevent')!);
    const k = await (await f.clientFor('coordinator')).get(`/api/classes/${id}`);
    expect(ev.startDate.toJSDate().toISOString()).toBe(k.body.startsAt);
    expect((ev.endDate.toJSDate().getTime() - ev.startDate.toJSDate().getTime()) / 60_000).toBe(90);
    expect(ev.location).toBe('Juniper Lane back room, 12 Elm St');
    expect(ev.uid).toBe(`class-${id}@cardwright.local`);
    expect(mail.text).toContain('What to bring: A bone folder');
    expect(mail.text).toMatch(/blade/i);
    expect((await mailTo(address, /./)).id).toBeDefined();
    expect(await Registration.count({ where: { id: regId, status: 'confirmed' } })).toBe(1);

    // The roster shows the seat as paid; the attendee's link shows confirmed.
    expect(k.body.seatsTaken).toBe(1);
    expect(k.body.registrations).toEqual([expect.objectContaining({ id: regId, name: 'Ada', email: address, status: 'confirmed' })]);
    const own = await visitor.get(`/api/registrations/${regId}?token=${registrationToken(regId)}`);
    expect(own.status).toBe(200);
    expect(own.body).toMatchObject({ id: regId, status: 'confirmed' });
    expect((await visitor.get(`/api/registrations/${regId}?token=${'x'.repeat(43)}`)).status).toBe(404);
  });

  it('declined: the seat is released, the link says why; a bad signature is 400 and changes nothing; an unknown session is recorded and ignored', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f, { seats: 1 });
    const a = await registerAs(id, 'Bea');
    const regId = a.res.body.id as string;
    const sig = signPayload('{"id":"evt_forged","type":"checkout.session.completed"}', 'whsec_wrong_secret');
    const forged = await new TestClient(app).agent
      .post('/api/payments/webhook')
      .set('content-type', 'application/json')
      .set('stripe-signature', sig)
      .send('{"id":"evt_forged","type":"checkout.session.completed"}');
    expect(forged.status).toBe(400);
    expect(forged.body.error).toMatch(/signature does not match/);
    expect(await statusOf(regId)).toBe('awaiting_payment');

    const body = JSON.stringify({
      id: `evt_${crypto.randomUUID()}`,
      type: 'checkout.session.completed',
      data: { object: { id: 'cs_test_nobody', payment_status: 'paid' } },
    });
    const unknown = await new TestClient(app).agent
      .post('/api/payments/webhook')
      .set('content-type', 'application/json')
      .set('stripe-signature', signPayload(body, config.payments.webhookSecret))
      .send(body);
    expect(unknown.status).toBe(200);
    expect(unknown.body.outcome).toBe('unknown session');

    await completeCheckout(a.res.body.checkoutUrl, 'declined');
    expect(await statusOf(regId)).toBe('cancelled');
    const own = await a.visitor.get(`/api/registrations/${regId}?token=${registrationToken(regId)}`);
    expect(own.body.message).toMatch(/Your card was declined\. The seat was released/);
    // The seat is free again: the next person gets it.
    const b = await registerAs(id, 'Cy');
    expect(b.res.body.status).toBe('awaiting_payment');
  });

  it('an unpaid hold expires and frees the seat; a duplicate e-mail is 409 and the link is sent again', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f, { seats: 1 });
    const a = await registerAs(id, 'Dee');
    const dup = await registerAs(id, 'Dee again', a.email);
    expect(dup.res.status).toBe(409);
    expect(dup.res.body.error).toMatch(/already registered.*sent the link/);
    await mailTo(a.email, /^Your registration/);
    const b = await registerAs(id, 'Eli');
    expect(b.res.body.status).toBe('waitlisted');
    // Move the hold's clock past its end, then run the queue's expiry handler.
    await Registration.update({ holdExpiresAt: new Date(Date.now() - 1000) }, { where: { id: a.res.body.id } });
    expect(await expireHold(a.res.body.id)).toBe('expired');
    expect(await statusOf(a.res.body.id)).toBe('expired');
    // The seat goes to the first on the waiting list, by e-mail; the expired checkout cannot be paid any more.
    expect(await statusOf(b.res.body.id)).toBe('awaiting_payment');
    await mailTo(b.email, /^A seat is free for you/);
    expect((await completeCheckout(a.res.body.checkoutUrl, 'paid')).status).toBe(409);
  });

  it('a free class confirms at once with no checkout; a cancelled or past class is 409 with words', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f, { kitFeeCents: 0 });
    const a = await registerAs(id, 'Flo');
    expect(a.res.status).toBe(201);
    expect(a.res.body.status).toBe('confirmed');
    expect(a.res.body.checkoutUrl).toBeUndefined();
    await mailTo(a.email, /^You’re in/);
    const c = await f.clientFor('coordinator');
    expect((await c.post(`/api/classes/${id}/cancel`)).status).toBe(200);
    const late = await registerAs(id, 'Gus');
    expect(late.res.status).toBe(409);
    expect(late.res.body.error).toMatch(/cancelled/);
    await mailTo(a.email, /^Cancelled/);
  });

  it('the webhook still confirms after the app was down between checkout and webhook (the provider retries)', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f);
    const a = await registerAs(id, 'Hal');
    await hook.stop();
    try {
      await completeCheckout(a.res.body.checkoutUrl, 'paid');
      expect(await statusOf(a.res.body.id)).toBe('awaiting_payment');
    } finally {
      await hook.start();
    }
    await expect.poll(() => statusOf(a.res.body.id), { timeout: 20_000, interval: 250 }).toBe('confirmed');
  });
});

describe('seats under load and the waiting list', () => {
  it('20 parallel registrations for 10 seats: exactly 10 holds and 10 waitlisted; 3 cancellations offer seats to the first 3 waiting, in order', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f, { seats: 10 });
    const results = await Promise.all(Array.from({ length: 20 }, (_, i) => registerAs(id, `Person ${i}`)));
    expect(
      results.map((r) => r.res.status),
      JSON.stringify(results.map((r) => r.res.body)),
    ).toEqual(Array(20).fill(201));
    const statuses = results.map((r) => r.res.body.status as string);
    expect(statuses.filter((s) => s === 'awaiting_payment')).toHaveLength(10);
    expect(statuses.filter((s) => s === 'waitlisted')).toHaveLength(10);
    const waiting = await Registration.findAll({ where: { classId: id, status: 'waitlisted' }, order: [['seq', 'ASC']] });
    const holders = results.filter((r) => r.res.body.status === 'awaiting_payment');
    const c = await f.clientFor('owner');
    for (const h of holders.slice(0, 3)) expect((await c.post(`/api/classes/${id}/registrations/${h.res.body.id}/cancel`, { refund: false })).status).toBe(200);
    const after = await Registration.findAll({ where: { classId: id }, order: [['seq', 'ASC']] });
    const offered = after.filter((r) => r.offeredAt !== null).map((r) => r.id);
    expect(offered).toEqual(waiting.slice(0, 3).map((r) => r.id));
    expect(after.filter((r) => r.status === 'waitlisted').map((r) => r.id)).toEqual(waiting.slice(3).map((r) => r.id));
    const roster = await c.get(`/api/classes/${id}`);
    expect(roster.body.seatsTaken).toBe(10);
    expect(
      roster.body.registrations.filter((r: { status: string }) => r.status === 'waitlisted').map((r: { waitlistPlace: number }) => r.waitlistPlace),
    ).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });
});

describe('the roster', () => {
  it('cancels a paid seat with a refund (notice mailed), exports CSV, ticks people off at the door and messages everyone', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f, { seats: 3 });
    const a = await registerAs(id, 'Ida');
    const b = await registerAs(id, '=HYPERLINK("x")');
    for (const r of [a, b]) await completeCheckout(r.res.body.checkoutUrl, 'paid');
    const c = await f.clientFor('coordinator');
    const maker = await f.clientFor('maker');
    const student = await f.clientFor('student');
    const url = `/api/classes/${id}/registrations/${a.res.body.id}`;

    expect((await (await f.clientFor('anonymous')).patch(url, { checkedIn: true })).status).toBe(401);
    expect((await c.patch(url, { checkedIn: 'yes' })).status).toBe(400);
    expect((await student.patch(url, { checkedIn: true })).status).toBe(403);
    const ticked = await maker.patch(url, { checkedIn: true });
    expect(ticked.status).toBe(200);
    expect(ticked.body.registrations.find((r: { id: string }) => r.id === a.res.body.id).checkedIn).toBe(true);

    const csv = await c.get(`/api/classes/${id}/roster.csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = csv.text.trim().split('\r\n');
    expect(lines[0]).toBe('Name,E-mail,Status,Paid,Registered at,Checked in');
    expect(lines[1]).toMatch(new RegExp(`^Ida,${a.email},paid,\\$15\\.00,.*,yes$`));
    // OWASP CSV Injection: a cell starting with = is prefixed with ' so a spreadsheet shows it as text.
    expect(lines[2]).toMatch(/^"'=HYPERLINK\(""x""\)"/);

    expect((await c.post(`/api/classes/${id}/messages`, { subject: '', body: '' })).status).toBe(400);
    const sent = await c.post(`/api/classes/${id}/messages`, { subject: 'Parking on Saturday', body: 'Use the lot behind the shop.' });
    expect(sent.status).toBe(202);
    expect(sent.body.sent).toBe(2);
    expect((await mailTo(b.email, /^Parking on Saturday$/)).text).toContain('Use the lot behind the shop.');

    const cancelled = await c.post(`/api/classes/${id}/registrations/${a.res.body.id}/cancel`, { refund: true });
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.registrations.find((r: { id: string }) => r.id === a.res.body.id).status).toBe('refunded');
    const notice = await mailTo(a.email, /^Refunded/);
    expect(notice.text).toContain('We refunded $15.00');
    expect((await c.post(`/api/classes/${id}/registrations/${a.res.body.id}/cancel`, { refund: true })).status).toBe(409);
  });
});

describe('reminders', () => {
  it('the reminder is a queue job a day before; moving its date to now sends it to confirmed attendees once', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f, { kitFeeCents: 0, startsAt: withOffset(inDays(3)) });
    const a = await registerAs(id, 'Jo');
    const { sequelize } = await import('@server/models');
    const [jobs] = (await sequelize.query(`SELECT id, start_after FROM pgboss.job WHERE name = 'class-reminder' AND data->>'classId' = :id`, {
      replacements: { id },
    })) as [{ id: string; start_after: Date }[], unknown];
    expect(jobs).toHaveLength(1);
    const k = await (await f.clientFor('owner')).get(`/api/classes/${id}`);
    expect(new Date(k.body.startsAt).getTime() - new Date(jobs[0]!.start_after).getTime()).toBe(24 * 3600_000);
    await sequelize.query(`UPDATE pgboss.job SET start_after = now() WHERE id = :job`, { replacements: { job: jobs[0]!.id } });
    const { startClassWorkers } = await import('@server/jobs');
    await startClassWorkers();
    const reminder = await mailTo(a.email, /^Reminder: /, 30);
    expect(reminder.text).toContain('Juniper Lane back room');
    await expect.poll(async () => (await Registration.findByPk(a.res.body.id))!.reminderSentAt !== null).toBe(true);
  });
});

describe('the kit planner', () => {
  it('pieces x (seats + spares), sheets per material, cost per kit and margin, worked by hand', async () => {
    const f = await makeStudio(app);
    const t = f.tutorial;
    // Our own round box kit. 12 x 12 in stock (common practice for scrapbook paper).
    const kraft = await Material.create({
      tutorialId: t.id,
      name: 'Kraft cardstock',
      sheetWidth: '12 in',
      sheetHeight: '12 in',
      sheetPriceCents: 125,
      sheetPriceCurrency: 'USD',
    });
    await Material.create({
      tutorialId: t.id,
      name: 'Patterned paper',
      sheetWidth: '12 in',
      sheetHeight: '12 in',
      sheetPriceCents: 80,
      sheetPriceCurrency: 'USD',
    });
    await PieceRow.create({ tutorialId: t.id, position: 0, name: 'Wall strip', material: 'Kraft cardstock', quantity: 2, width: '12 in', height: '2 in' });
    await PieceRow.create({ tutorialId: t.id, position: 1, name: 'Lid mat', material: 'Patterned paper', quantity: 1, width: '5 in', height: '5 in' });
    const id = await schedule(f, { seats: 8, spares: 1 });
    const c = await f.clientFor('coordinator');
    expect((await (await f.clientFor('student')).get(`/api/classes/${id}/kit-plan`)).status).toBe(403);
    const plan = (await c.get(`/api/classes/${id}/kit-plan`)).body;
    // By hand: 8 seats + 1 spare = 9 kits.
    expect(plan.kits).toBe(9);
    // Wall strips: 2 a kit x 9 = 18; a 12 x 2 in strip fits 6 to a 12 x 12 in sheet (12 / 2 = 6), so 18 / 6 = 3 sheets.
    // Lid mats: 1 a kit x 9 = 9; 5 x 5 in fits 2 across and 2 down a 12 in sheet (2 x 5 = 10 <= 12 < 15), 4 a sheet, so ceil(9 / 4) = 3 sheets.
    expect(plan.pieces).toEqual([
      expect.objectContaining({ name: 'Wall strip', perKit: 2, total: 18, sizeInches: '12 in x 2 in', sizeMm: '304.8 mm x 50.8 mm' }),
      expect.objectContaining({ name: 'Lid mat', perKit: 1, total: 9, sizeInches: '5 in x 5 in', sizeMm: '127 mm x 127 mm' }),
    ]);
    const byName = Object.fromEntries(plan.materials.map((m: { material: string }) => [m.material, m]));
    expect(byName['Kraft cardstock']).toMatchObject({ sheets: 3, costCents: 375 }); // 3 x $1.25 = $3.75
    expect(byName['Patterned paper']).toMatchObject({ sheets: 3, costCents: 240 }); // 3 x $0.80 = $2.40
    // Total $3.75 + $2.40 = $6.15; per kit 615 / 9 = 68.33... -> 68 cents; margin $15.00 x 8 - $6.15 = $113.85.
    expect(plan).toMatchObject({ totalCostCents: 615, costPerKitCents: 68, marginCents: 11385, complete: true });
    expect(kraft.id).toBe(byName['Kraft cardstock'].materialId);

    const pdf = await c
      .get(`/api/classes/${id}/kits.pdf?paper=a4`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (d: Buffer) => chunks.push(d));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(pdf.status).toBe(200);
    // A4 is 595.28 x 841.89 pt (PDF reference; ISO 216 210 x 297 mm).
    expect((pdf.body as Buffer).toString('latin1')).toMatch(/\/MediaBox \[0 0 595\.28 841\.89\]/);
  });

  it('a tutorial with no cut list: the planner says what to do', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f);
    const plan = (await (await f.clientFor('coordinator')).get(`/api/classes/${id}/kit-plan`)).body;
    expect(plan.empty).toBe(true);
    expect(plan.emptyMessage).toMatch(/no cut list yet.*Cut list section/);
  });
});

describe('attendees with an account', () => {
  it('a student registered with their account’s address sees the class and its handout', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f, { kitFeeCents: 0 });
    const student = await f.clientFor('student');
    const res = await student.post(`/api/classes/${id}/registrations`, { name: 'Test student', email: f.users.student.email });
    expect(res.body.status).toBe('confirmed');
    const mine = await student.get('/api/my/classes');
    expect(mine.status).toBe(200);
    expect(mine.body.classes).toEqual([
      expect.objectContaining({ registrationId: res.body.id, status: 'confirmed', handoutUrl: expect.stringContaining('/handout.pdf?token=') }),
    ]);
    const handout = await student.get(mine.body.classes[0].handoutUrl);
    expect(handout.status).toBe(200);
    expect(handout.headers['content-type']).toBe('application/pdf');
    expect((await new TestClient(app).get('/api/my/classes')).status).toBe(401);
    void Tutorial;
  });
});

describe('class messages and e-mail settings', () => {
  it('a member who turned class messages off does not get the teacher’s message; other attendees do', async () => {
    const f = await makeStudio(app);
    const id = await schedule(f);
    await Registration.create({
      classId: id,
      userId: f.users.student.id,
      name: 'Test student',
      email: f.users.student.email,
      status: 'confirmed',
      currency: 'USD',
      confirmedAt: new Date(),
    });
    const other = await registerAs(id, 'Wren');
    await completeCheckout(other.res.body.checkoutUrl, 'paid');
    expect((await (await f.clientFor('student')).put(`/api/studios/${f.studio.id}/mail-settings`, { classMail: false })).status).toBe(200);
    const sent = await (await f.clientFor('coordinator')).post(`/api/classes/${id}/messages`, { subject: 'Bring a bone folder', body: 'See you Saturday.' });
    expect(sent.status).toBe(202);
    await mailTo(other.email, /^Bring a bone folder$/);
    // The sends run side by side: give the member's a moment to arrive, were it sent.
    await new Promise((r) => setTimeout(r, 1500));
    expect((await mailsTo(f.users.student.email)).filter((m) => m.subject === 'Bring a bone folder')).toHaveLength(0);
  });
});
