import { Router } from 'express';
import { idParams } from '@shared/schemas/studio';
import {
  checkInSchema,
  createClassSchema,
  kitsQuery,
  materialPriceSchema,
  messageAllSchema,
  publicClassParams,
  registerSchema,
  registrationParams,
  registrationTokenSchema,
  staffCancelSchema,
  updateClassSchema,
  type CheckoutStartedDto,
  type ClassListDto,
  type MessagesSentDto,
  type RegistrationCancelledDto,
  type MyClassesDto,
  type RegistrationCreatedDto,
} from '@shared/schemas/class';
import { paperQuery } from '@shared/schemas/publish';
import { route, openRoute } from '../../lib/route';
import { NotFoundError } from '../../lib/errors';
import { attendeeAbilities, authorize, classAbilities } from '../../policies';
import { loadClass, loadStudio, loadTutorial } from '../../services/access';
import { scheduleReminder } from '../../jobs/class-jobs';
import {
  classCautions,
  classPublicPath,
  createClass,
  findClass,
  listClasses,
  registrationPath,
  seatCounts,
  updateClass,
  whenText,
  classTitle,
} from '../../services/classes';
import {
  cancelClass,
  cancelOwn,
  cancelRegistration,
  findRegistrationOf,
  messageAttendees,
  offerFreedSeats,
  reconcile,
  register,
  registrationByToken,
  registrationContext,
  registrationsOf,
  rosterOf,
  setCheckedIn,
  startCheckout,
  waitlistPlace,
} from '../../services/registrations';
import { classCalendar, classHandoutPdf, sendClassMessage } from '../../services/class-mail';
import { registrationToken } from '../../services/registration-token';
import { kitPlan, setSheetPrice } from '../../services/kit-plan';
import { kitsPdf } from '../../services/publish/kits';
import { findMaterial } from '../../services/cut-list';
import { presentMaterial } from '../../presenters/cut-list.presenter';
import { presentClass, presentClassSummary, presentMyClass, presentPublicClass, presentRegistration } from '../../presenters/class.presenter';
import { rosterCsv } from './roster-csv';

const fileName = (s: string) =>
  s
    .replace(/[^a-z0-9-]+/gi, '-')
    .replace(/^-|-$/g, '')
    .toLowerCase() || 'class';

/** Loads what the staff view of a class shows and presents it. */
async function staffView(klassId: string, abilities: Parameters<typeof presentClass>[6]) {
  const k = await findClass(klassId);
  const [regs, counts, cautions] = await Promise.all([rosterOf(k.id), seatCounts(k.id), classCautions(k, k.tutorial)]);
  return presentClass(k, k.studio, k.tutorial, regs, counts, cautions, abilities);
}

/** The public face of a class (no roster), for its page and the attendee's. */
async function publicView(classId: string) {
  const k = await findClass(classId);
  const [counts, cautions] = await Promise.all([seatCounts(k.id), classCautions(k, k.tutorial)]);
  return { k, pub: presentPublicClass(k, k.studio, k.tutorial, counts, cautions.lines) };
}

const attendeeLinks = (id: string, token: string) => ({
  handout: `/api/registrations/${id}/handout.pdf?token=${encodeURIComponent(token)}`,
  calendar: `/api/registrations/${id}/calendar.ics?token=${encodeURIComponent(token)}`,
});

/** Classes (C1–C2): scheduling, the roster, registration and payment, the kit planner. */
export function classesRouter() {
  const r = Router();

  r.post(
    '/tutorials/:id/classes',
    route({ params: idParams, body: createClassSchema }, async ({ params, body, user, res }) => {
      const { tutorial, actor, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'scheduleClass', 'Only owners, coordinators and the tutorial’s maker can schedule a class from it');
      const k = await createClass(tutorial, user, body);
      await scheduleReminder(k.id, k.startsAt);
      const view = await staffView(k.id, classAbilities(actor, { tutorialAuthorId: tutorial.authorId }));
      res.status(201).json({ ...view, class: view });
    }),
  );

  r.get(
    '/studios/:id/classes',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'listClasses', 'Classes are run by owners, coordinators and makers; your classes are under “Your classes”');
      const list = await listClasses(studio.id, abilities.runClasses ? null : user.id);
      const classes = await Promise.all(list.map(async (k) => presentClassSummary(k, k.tutorial!, studio, await seatCounts(k.id))));
      const answer: ClassListDto = { classes, abilities: { schedule: abilities.scheduleClasses } };
      res.json(answer);
    }),
  );

  r.get(
    '/classes/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { klass, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'read', 'Only the people who run this class can see its roster');
      res.json(await staffView(klass.id, abilities));
    }),
  );

  r.patch(
    '/classes/:id',
    route({ params: idParams, body: updateClassSchema }, async ({ params, body, user, res }) => {
      const { klass, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'update', 'Only the people who run this class can change it');
      const changed = await updateClass(klass.id, body);
      if (changed.startsAtChanged) await scheduleReminder(changed.klass.id, changed.klass.startsAt);
      if (body.seats !== undefined) await offerFreedSeats(klass.id);
      res.json(await staffView(klass.id, abilities));
    }),
  );

  r.post(
    '/classes/:id/cancel',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { klass, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'manageRoster', 'Only the people who run this class can cancel it');
      await cancelClass(klass.id);
      res.json(await staffView(klass.id, abilities));
    }),
  );

  r.get(
    '/classes/:id/roster.csv',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { klass, tutorial, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'read', 'Only the people who run this class can export its roster');
      const regs = await rosterOf(klass.id);
      res.type('text/csv; charset=utf-8');
      res.attachment(`${fileName(classTitle(klass, tutorial))}-roster.csv`);
      res.send(rosterCsv(regs));
    }),
  );

  r.post(
    '/classes/:id/messages',
    route({ params: idParams, body: messageAllSchema }, async ({ params, body, user, res }) => {
      const { klass, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'manageRoster', 'Only the people who run this class can message its attendees');
      const sent = await messageAttendees(klass.id, (c, reg) => sendClassMessage(c, reg, body.subject, body.body));
      res.status(202).json({
        sent,
        message: sent ? `Sending to ${sent} attendee${sent === 1 ? '' : 's'}.` : 'Nobody has a seat yet, so nothing was sent.',
      } satisfies MessagesSentDto);
    }),
  );

  r.post(
    '/classes/:id/registrations/:registrationId/cancel',
    route({ params: registrationParams, body: staffCancelSchema }, async ({ params, body, user, res }) => {
      const { klass, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'manageRoster', 'Only the people who run this class can cancel registrations');
      const reg = await findRegistrationOf(klass.id, params.registrationId);
      await cancelRegistration(reg.id, { refund: body.refund, byTeacher: true });
      res.json(await staffView(klass.id, abilities));
    }),
  );

  r.patch(
    '/classes/:id/registrations/:registrationId',
    route({ params: registrationParams, body: checkInSchema }, async ({ params, body, user, res }) => {
      const { klass, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'manageRoster', 'Only the people who run this class can tick people off');
      const reg = await findRegistrationOf(klass.id, params.registrationId);
      await setCheckedIn(reg, body.checkedIn);
      res.json(await staffView(klass.id, abilities));
    }),
  );

  r.get(
    '/classes/:id/kit-plan',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { klass, tutorial, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'read', 'Only the people who run this class can plan its kits');
      res.json(await kitPlan(klass, tutorial));
    }),
  );

  r.get(
    '/classes/:id/kits.pdf',
    route({ params: idParams, query: kitsQuery }, async ({ params, query, user, res }) => {
      const { klass, tutorial, studio, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'read', 'Only the people who run this class can print its kits');
      const plan = await kitPlan(klass, tutorial);
      const pdf = await kitsPdf({
        title: classTitle(klass, tutorial),
        studioName: studio.name,
        when: whenText(klass),
        place: klass.place,
        plan,
        paper: query.paper,
      });
      res.type('application/pdf');
      res.attachment(`${fileName(classTitle(klass, tutorial))}-kits-${query.paper}.pdf`);
      res.send(pdf);
    }),
  );

  r.get(
    '/classes/:id/handout.pdf',
    route({ params: idParams, query: paperQuery }, async ({ params, query, user, res }) => {
      const { klass, tutorial, studio, abilities } = await loadClass(user, params.id);
      authorize(abilities, 'read', 'Only the people who run this class can print its handout');
      const pdf = await classHandoutPdf({ klass: Object.assign(klass, { paper: query.paper }), studio, tutorial });
      res.type('application/pdf');
      res.attachment(`${fileName(tutorial.slug)}-class-handout-${query.paper}.pdf`);
      res.send(pdf);
    }),
  );

  // The kit planner keeps a price per stock sheet on each material.
  r.put(
    '/materials/:id/price',
    route({ params: idParams, body: materialPriceSchema }, async ({ params, body, user, res }) => {
      const m = await findMaterial(params.id);
      const { abilities } = await loadTutorial(user, m.tutorialId);
      authorize(abilities, 'update');
      res.json(presentMaterial(await setSheetPrice(m, body)));
    }),
  );

  // Open to anyone: the public page, registering, and the attendee's own link.

  r.get(
    '/public/classes/:studio/:id',
    openRoute({ params: publicClassParams }, async ({ params, res }) => {
      const { k, pub } = await publicView(params.id);
      if (k.studio.slug !== params.studio) throw new NotFoundError('Class');
      res.json(pub);
    }),
  );

  r.post(
    '/classes/:id/registrations',
    openRoute({ params: idParams, body: registerSchema }, async ({ params, body, user, res }) => {
      const { registration: reg, checkoutUrl, context } = await register(params.id, body, user);
      const token = registrationToken(reg.id);
      const answer: RegistrationCreatedDto = {
        id: reg.id,
        status: reg.status,
        ...(checkoutUrl ? { checkoutUrl } : {}),
        registrationUrl: registrationPath(context.studio.slug, context.klass.id, reg.id, token),
        message:
          reg.status === 'awaiting_payment'
            ? 'Your seat is held while you pay the kit fee.'
            : reg.status === 'confirmed'
              ? 'You’re in: check your inbox for the confirmation and the handout.'
              : 'The class is full, so you are on the waiting list; we e-mail you if a seat opens up.',
      };
      res.status(201).json(answer);
    }),
  );

  r.get(
    '/registrations/:id',
    openRoute({ params: idParams, query: registrationTokenSchema }, async ({ params, query, res }) => {
      const reg = await reconcile(await registrationByToken(params.id, query.token));
      const { k, pub } = await publicView(reg.classId);
      const abilities = attendeeAbilities(reg, k);
      res.json(
        presentRegistration(reg, pub, {
          place: await waitlistPlace(reg),
          links: attendeeLinks(reg.id, query.token),
          canCancel: abilities.cancel,
          cancelNote: abilities.withinDeadline ? null : 'The cancellation deadline has passed; write to the teacher if you cannot come.',
        }),
      );
    }),
  );

  r.post(
    '/registrations/:id/checkout',
    openRoute({ params: idParams, body: registrationTokenSchema }, async ({ params, body, res }) => {
      const reg = await registrationByToken(params.id, body.token);
      const url = await startCheckout(reg, await registrationContext(reg));
      res.json({ checkoutUrl: url, status: (await reg.reload()).status } satisfies CheckoutStartedDto);
    }),
  );

  r.post(
    '/registrations/:id/cancel',
    openRoute({ params: idParams, body: registrationTokenSchema }, async ({ params, body, res }) => {
      const reg = await registrationByToken(params.id, body.token);
      const k = await findClass(reg.classId);
      const done = await cancelOwn(reg, k);
      res.json({ id: done.id, status: done.status } satisfies RegistrationCancelledDto);
    }),
  );

  r.get(
    '/registrations/:id/handout.pdf',
    openRoute({ params: idParams, query: registrationTokenSchema }, async ({ params, query, res }) => {
      const reg = await registrationByToken(params.id, query.token);
      const c = await registrationContext(reg);
      if (!attendeeAbilities(reg, c.klass).readHandout) throw NotFoundError.saying('The handout comes with a confirmed seat');
      res.type('application/pdf');
      res.attachment(`${fileName(c.tutorial.slug)}-handout.pdf`);
      res.send(await classHandoutPdf(c));
    }),
  );

  r.get(
    '/registrations/:id/calendar.ics',
    openRoute({ params: idParams, query: registrationTokenSchema }, async ({ params, query, res }) => {
      const reg = await registrationByToken(params.id, query.token);
      const c = await registrationContext(reg);
      if (!attendeeAbilities(reg, c.klass).readCalendar) throw NotFoundError.saying('The calendar invitation comes with a confirmed seat');
      res.type('text/calendar; charset=utf-8');
      res.attachment(`${fileName(c.tutorial.slug)}.ics`);
      res.send(classCalendar(c));
    }),
  );

  r.get(
    '/my/classes',
    route({}, async ({ user, res }) => {
      const regs = await registrationsOf(user);
      const classes = await Promise.all(
        regs
          .filter((x) => x.status !== 'expired')
          .map(async (reg) => {
            const { pub } = await publicView(reg.classId);
            const token = registrationToken(reg.id);
            return presentMyClass(reg, pub, {
              registration: `${classPublicPath(pub.studio.slug, reg.classId)}/r/${reg.id}?token=${encodeURIComponent(token)}`,
              handout: attendeeLinks(reg.id, token).handout,
            });
          }),
      );
      const answer: MyClassesDto = { classes };
      res.json(answer);
    }),
  );

  return r;
}
