import { describe, expect, it, beforeAll } from 'vitest';
import { Brief, Comment, CraftClass, Material, OutboxMessage, Registration, Tutorial, TutorialVersion } from '@server/models';
import { draftContent } from '@server/services/versions/content';
import type { TutorialState } from '@shared/schemas/tutorial';
import { registrationToken } from '@server/services/registration-token';
import { testApp } from '../../tests/harness/app';
import { makeStudio, type StudioFixture } from '../../tests/harness/factories';

/**
 * Every route with every role (DESIGN.md, Roles) and an owner of another studio. Outsiders get
 * 404 so ids of other studios do not leak; members without the right role get 403.
 */
const app = testApp();
type Who = 'owner' | 'coordinator' | 'maker' | 'student' | 'outsider' | 'anonymous';
const WHO: Who[] = ['owner', 'coordinator', 'maker', 'student', 'outsider', 'anonymous'];

type Route = {
  name: string;
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: (f: StudioFixture, t: Tutorial, who: Who) => string;
  body?: (f: StudioFixture) => object;
  /** Extra request headers (a proxy's forwarding header, another Host). */
  headers?: Record<string, string>;
  expect: Record<Who, number>;
  /** Destructive routes get a fresh tutorial per caller. */
  fresh?: boolean;
  /** The state the fresh tutorial starts in (draft unless said). */
  state?: TutorialState;
  /** The fresh tutorial has a publish time set (an approved one, for cancelling it). */
  scheduled?: boolean;
};

/** A thread on the fixture's tutorial, started by its coordinator. */
const cmt = { id: '' };
const COMMENTS = { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 };
const READS_REVIEW = { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 };
const REVIEWS = { owner: 200, coordinator: 200, maker: 403, student: 403, outsider: 404, anonymous: 401 };
/** A review move made on a fresh tutorial in the state it needs. */
const move = (action: string, state: TutorialState, expect: Record<Who, number>, note?: string): Route => ({
  name: `${action} (from ${state})`,
  method: 'post',
  path: (_f, t) => `/api/tutorials/${t.id}/state`,
  fresh: true,
  state,
  body: () => ({ action, ...(note ? { note } : {}) }),
  expect,
});

/** A free class of the fixture's tutorial with one confirmed attendee, and a material to price. */
const cls = { id: '', registrationId: '', materialId: '' };
const classUrl =
  (rest = '') =>
  () =>
    `/api/classes/${cls.id}${rest}`;
/** A brief for the fixture's maker; destructive brief routes get one of their own per caller. */
const brief = { id: '' };
const BRIEF_READ = { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 };
const freshBriefs: Promise<Brief>[] = [];
function freshBrief(f: StudioFixture): string {
  // made synchronously for the path: the row is created before the request by the test below
  const id = crypto.randomUUID();
  freshBriefs.push(Brief.create({ id, studioId: f.studio.id, makerId: f.users.maker.id, title: 'Matrix brief', dueDate: '2027-02-01' }));
  return id;
}
const RUNS_CLASS = { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 };

const ROUTES: Route[] = [
  {
    name: 'read studio',
    method: 'get',
    path: (f) => `/api/studios/${f.studio.id}`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 404, anonymous: 401 },
  },
  {
    name: 'rename studio',
    method: 'patch',
    path: (f) => `/api/studios/${f.studio.id}`,
    body: () => ({ name: 'Renamed' }),
    expect: { owner: 200, coordinator: 403, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list tutorials',
    method: 'get',
    path: (f) => `/api/studios/${f.studio.id}/tutorials`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list members',
    method: 'get',
    path: (f) => `/api/studios/${f.studio.id}/members`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 404, anonymous: 401 },
  },
  {
    name: 'invite',
    method: 'post',
    path: (f) => `/api/studios/${f.studio.id}/invitations`,
    body: () => ({ email: `${crypto.randomUUID()}@test.example`, role: 'maker' }),
    expect: { owner: 201, coordinator: 403, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'change a role',
    method: 'patch',
    path: (f) => `/api/studios/${f.studio.id}/members/${f.users.student.id}`,
    body: () => ({ role: 'student' }),
    expect: { owner: 200, coordinator: 403, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'create tutorial',
    method: 'post',
    path: () => '/api/tutorials',
    body: (f) => ({ studioId: f.studio.id, title: 'Matrix tutorial' }),
    expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'read draft tutorial',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'rename tutorial',
    method: 'patch',
    path: (_f, t) => `/api/tutorials/${t.id}`,
    body: () => ({ title: 'Renamed tutorial' }),
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'delete tutorial',
    method: 'delete',
    path: (_f, t) => `/api/tutorials/${t.id}`,
    fresh: true,
    expect: { owner: 204, coordinator: 403, maker: 204, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list recordings',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/recordings`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list pieces',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/pieces`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'add a piece',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/pieces`,
    body: () => ({ name: 'Mat', width: '4', height: '5 1/4' }),
    expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list mentions',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/mentions`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'make pieces from all mentions',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/mentions/pieces`,
    body: () => ({}),
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'score lines from a mention (none said: 400 after the access check)',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/mentions/score-lines`,
    body: () => ({ key: '0:score at one inch', pieceId: '00000000-0000-4000-8000-000000000000', axis: 'width' }),
    expect: { owner: 400, coordinator: 400, maker: 400, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'read the assembly',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/assembly`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'assemble (no recording yet: 409 after the access check)',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/assembly`,
    body: () => ({}),
    expect: { owner: 409, coordinator: 409, maker: 409, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'accept every proposal',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/assembly/accept`,
    body: () => ({}),
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'drop every proposal',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/assembly/drop`,
    body: () => ({}),
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'undo a proposal (not of this tutorial: 400 after the access check)',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/assembly/undo`,
    body: () => ({ ids: ['00000000-0000-4000-8000-000000000000'] }),
    expect: { owner: 400, coordinator: 400, maker: 400, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'sheet plan',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/sheet-plan?kits=2`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'add a material',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/materials`,
    fresh: true,
    body: () => ({ name: 'vellum', sheetWidth: '8 1/2', sheetHeight: '11' }),
    expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list supplies',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/supplies`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'check supplies against the sheet plan',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/supply-checks`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'add a supply',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/supplies`,
    body: () => ({ category: 'tool', name: 'Bone folder' }),
    expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'read the write-up',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/article`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'save the write-up',
    method: 'put',
    path: (_f, t) => `/api/tutorials/${t.id}/article`,
    fresh: true,
    body: () => ({ version: 0, doc: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Hello' }] }] } }),
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list revisions',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/revisions`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    // Students read a published tutorial's write-up, never its text from before publication.
    name: 'list revisions of a published tutorial',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/revisions`,
    fresh: true,
    state: 'published',
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'draft (no footage yet)',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/draft`,
    expect: { owner: 409, coordinator: 409, maker: 409, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'send for review',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/state`,
    fresh: true,
    body: () => ({ action: 'submit' }),
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  move('submit', 'needs_changes', { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 }, 'Fixed the lid'),
  move('approve', 'in_review', REVIEWS, 'Lovely'),
  move('sendBack', 'in_review', REVIEWS, 'See the comments'),
  move('sendBack', 'approved', REVIEWS),
  move('publish', 'approved', REVIEWS),
  move('unpublish', 'published', REVIEWS),
  // A move the state does not allow: 409 for those who could make it in the right state.
  move('approve', 'draft', { owner: 409, coordinator: 409, maker: 409, student: 409, outsider: 404, anonymous: 401 }),
  { name: 'review history', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/history`, expect: READS_REVIEW },
  { name: 'review checklist', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/checklist`, expect: READS_REVIEW },
  { name: 'list comments', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/comments`, expect: READS_REVIEW },
  { name: 'people to mention', method: 'get', path: (_f, t) => `/api/tutorials/${t.id}/mentionable`, expect: READS_REVIEW },
  { name: 'add a comment', method: 'post', path: (_f, t) => `/api/tutorials/${t.id}/comments`, body: () => ({ body: 'Matrix comment' }), expect: COMMENTS },
  { name: 'reply to a comment', method: 'post', path: () => `/api/comments/${cmt.id}/replies`, body: () => ({ body: 'Matrix reply' }), expect: COMMENTS },
  {
    name: 'resolve a thread',
    method: 'patch',
    path: () => `/api/comments/${cmt.id}`,
    body: () => ({ resolved: true }),
    expect: { ...COMMENTS, owner: 200, coordinator: 200, maker: 200 },
  },
  {
    name: 'reopen a thread',
    method: 'patch',
    path: () => `/api/comments/${cmt.id}`,
    body: () => ({ resolved: false }),
    expect: { ...COMMENTS, owner: 200, coordinator: 200, maker: 200 },
  },
  {
    name: 'change a comment’s words (its author, the coordinator, only)',
    method: 'patch',
    path: () => `/api/comments/${cmt.id}`,
    body: () => ({ body: 'Matrix comment, edited' }),
    expect: { owner: 403, coordinator: 200, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'own mail settings',
    method: 'get',
    path: (f) => `/api/studios/${f.studio.id}/mail-settings`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 404, anonymous: 401 },
  },
  {
    name: 'change own mail settings',
    method: 'put',
    path: (f) => `/api/studios/${f.studio.id}/mail-settings`,
    body: () => ({ classMail: true }),
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 404, anonymous: 401 },
  },
  {
    name: 'export a draft’s description',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/export/description.txt`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 404 },
  },
  {
    name: 'a draft’s template page count',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/export/template.json?paper=letter`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 404 },
  },
  // What is published stays as approved (T4): versions and comparisons are the workspace's;
  // the reader's view is whoever may read the published tutorial.
  {
    name: 'list the versions',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/versions`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'compare with what was sent back',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/compare?from=sent_back&to=draft`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'the reader’s view of a published tutorial',
    method: 'get',
    path: () => `/api/tutorials/${live.id}/published`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 200, anonymous: 200 },
  },
  {
    name: 'the reader’s view of a draft',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/published`,
    expect: { owner: 404, coordinator: 404, maker: 404, student: 403, outsider: 404, anonymous: 404 },
  },
  {
    name: 'an export of a published tutorial’s draft (its pending update)',
    method: 'get',
    path: () => `/api/tutorials/${live.id}/export/description.txt?version=draft`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 403, anonymous: 403 },
  },
  {
    name: 'schedule a class',
    method: 'post',
    path: (_f, t) => `/api/tutorials/${t.id}/classes`,
    body: () => ({
      startsAt: new Date(Date.now() + 7 * 86_400_000).toISOString(),
      durationMinutes: 60,
      place: 'Studio',
      seats: 4,
      kitFeeCents: 0,
      currency: 'USD',
    }),
    expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list the studio’s classes',
    method: 'get',
    path: (f) => `/api/studios/${f.studio.id}/classes`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  { name: 'read a class and its roster', method: 'get', path: classUrl(), expect: RUNS_CLASS },
  { name: 'change a class', method: 'patch', path: classUrl(), body: () => ({ whatToBring: 'Scissors' }), expect: RUNS_CLASS },
  { name: 'roster as CSV', method: 'get', path: classUrl('/roster.csv'), expect: RUNS_CLASS },
  {
    name: 'message the attendees',
    method: 'post',
    path: classUrl('/messages'),
    body: () => ({ subject: 'See you soon', body: 'Bring a bone folder.' }),
    expect: { ...RUNS_CLASS, owner: 202, coordinator: 202, maker: 202 },
  },
  {
    name: 'tick off at the door',
    method: 'patch',
    path: () => `/api/classes/${cls.id}/registrations/${cls.registrationId}`,
    body: () => ({ checkedIn: true }),
    expect: RUNS_CLASS,
  },
  { name: 'kit planner', method: 'get', path: classUrl('/kit-plan'), expect: RUNS_CLASS },
  { name: 'kits PDF', method: 'get', path: classUrl('/kits.pdf?paper=letter'), expect: RUNS_CLASS },
  { name: 'class handout PDF', method: 'get', path: classUrl('/handout.pdf'), expect: RUNS_CLASS },
  {
    name: 'price a material',
    method: 'put',
    path: () => `/api/materials/${cls.materialId}/price`,
    body: () => ({ sheetPriceCents: 125, sheetPriceCurrency: 'USD' }),
    expect: RUNS_CLASS,
  },
  {
    name: 'public class page',
    method: 'get',
    path: (f) => `/api/public/classes/${f.studio.slug}/${cls.id}`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 200, anonymous: 200 },
  },
  {
    name: 'register for a class (no account needed)',
    method: 'post',
    path: classUrl('/registrations'),
    body: () => ({ name: 'Matrix attendee', email: `${crypto.randomUUID()}@attendee.example` }),
    expect: { owner: 201, coordinator: 201, maker: 201, student: 201, outsider: 201, anonymous: 201 },
  },
  {
    name: 'an attendee’s registration by its link',
    method: 'get',
    path: () => `/api/registrations/${cls.registrationId}?token=${registrationToken(cls.registrationId)}`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 200, anonymous: 200 },
  },
  {
    name: 'your classes',
    method: 'get',
    path: () => '/api/my/classes',
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 200, anonymous: 401 },
  },
  // The Outbox lists each person's own mail, whatever their role; anyone else's message is 404.
  {
    name: 'read own outbox',
    method: 'get',
    path: () => '/api/outbox',
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 200, anonymous: 401 },
  },
  {
    name: 'read a message addressed to someone else',
    method: 'get',
    path: () => `/api/outbox/${elsewhere.id}`,
    expect: { owner: 404, coordinator: 404, maker: 404, student: 404, outsider: 404, anonymous: 401 },
  },
  {
    name: 'delete a message addressed to someone else',
    method: 'delete',
    path: () => `/api/outbox/${elsewhere.id}`,
    expect: { owner: 404, coordinator: 404, maker: 404, student: 404, outsider: 404, anonymous: 401 },
  },
  {
    name: 'read a message addressed to me',
    method: 'get',
    path: (_f, _t, who) => `/api/outbox/${mine[who]?.id ?? crypto.randomUUID()}`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 200, anonymous: 401 },
  },
  {
    name: 'delete a message addressed to me',
    method: 'delete',
    path: (_f, _t, who) => `/api/outbox/${mine[who]?.id ?? crypto.randomUUID()}`,
    expect: { owner: 204, coordinator: 204, maker: 204, student: 204, outsider: 204, anonymous: 401 },
  },
  {
    name: 'clear own outbox',
    method: 'delete',
    path: () => '/api/outbox',
    expect: { owner: 204, coordinator: 204, maker: 204, student: 204, outsider: 204, anonymous: 401 },
  },
  // Briefs and targets (DESIGN.md T3): coordinators and owners hand out; the maker it is for reads and starts it.
  {
    name: 'list briefs',
    method: 'get',
    path: (f) => `/api/studios/${f.studio.id}/briefs`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'hand out a brief',
    method: 'post',
    path: (f) => `/api/studios/${f.studio.id}/briefs`,
    body: (f) => ({ title: 'Matrix brief', makerId: f.users.maker.id, dueDate: '2027-02-01' }),
    expect: { owner: 201, coordinator: 201, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  { name: 'read a brief', method: 'get', path: () => `/api/briefs/${brief.id}`, expect: BRIEF_READ },
  {
    name: 'change a brief',
    method: 'patch',
    path: () => `/api/briefs/${brief.id}`,
    body: () => ({ notes: 'Matrix notes' }),
    expect: { owner: 200, coordinator: 200, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'withdraw a brief',
    method: 'delete',
    path: (f) => `/api/briefs/${freshBrief(f)}`,
    expect: { owner: 204, coordinator: 204, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'start the tutorial from a brief',
    method: 'post',
    path: (f) => `/api/briefs/${freshBrief(f)}/tutorial`,
    expect: { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'the brief of a tutorial',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/brief`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    // The brief's notes are the team's: a student who may read the published tutorial still gets 403.
    name: 'the brief of a published tutorial',
    method: 'get',
    path: (_f, t) => `/api/tutorials/${t.id}/brief`,
    fresh: true,
    state: 'published',
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'list monthly targets',
    method: 'get',
    path: (f) => `/api/studios/${f.studio.id}/targets`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'set a monthly target',
    method: 'put',
    path: (f) => `/api/studios/${f.studio.id}/targets/${f.users.maker.id}`,
    body: () => ({ perMonth: 2 }),
    expect: { owner: 200, coordinator: 200, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'the studio board',
    method: 'get',
    path: (f) => `/api/studios/${f.studio.id}/board`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'schedule publishing',
    method: 'put',
    path: (_f, t) => `/api/tutorials/${t.id}/schedule`,
    fresh: true,
    state: 'approved',
    body: () => ({ at: new Date(Date.now() + 3 * 86_400_000).toISOString(), timeZone: 'Europe/London' }),
    expect: { owner: 200, coordinator: 200, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  {
    name: 'cancel a scheduled publish',
    method: 'delete',
    path: (_f, t) => `/api/tutorials/${t.id}/schedule`,
    fresh: true,
    state: 'approved',
    scheduled: true,
    expect: { owner: 200, coordinator: 200, maker: 403, student: 403, outsider: 404, anonymous: 401 },
  },
  // The development mailbox of every caught message is a tool of this machine, not of a role: the
  // same answer for everyone from the loopback interface, and 404 for everyone through a proxy or
  // under another host name (DNS rebinding). Production never mounts it (security-faults tests).
  {
    name: 'development mailbox from this machine',
    method: 'get',
    path: () => '/dev/mail',
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 200, anonymous: 200 },
  },
  {
    name: 'a caught message in the development mailbox',
    method: 'get',
    path: () => `/dev/mail/${elsewhere.id}`,
    expect: { owner: 200, coordinator: 200, maker: 200, student: 200, outsider: 200, anonymous: 200 },
  },
  {
    name: 'development mailbox through a proxy',
    method: 'get',
    path: () => `/dev/mail/${elsewhere.id}`,
    headers: { 'X-Forwarded-For': '203.0.113.9' },
    expect: { owner: 404, coordinator: 404, maker: 404, student: 404, outsider: 404, anonymous: 404 },
  },
  {
    name: 'development mailbox under another host name',
    method: 'get',
    path: () => '/dev/mail',
    headers: { Host: 'attacker.example' },
    expect: { owner: 404, coordinator: 404, maker: 404, student: 404, outsider: 404, anonymous: 404 },
  },
];

let f: StudioFixture;
/** A published tutorial of the studio. */
let live: Tutorial;
/** A caught message for an address outside the studio (a reset link, say). */
let elsewhere: OutboxMessage;
/** A caught message for each caller's own address. */
const mine: Partial<Record<Who, OutboxMessage>> = {};
beforeAll(async () => {
  f = await makeStudio(app);
  const k = await CraftClass.create({
    studioId: f.studio.id,
    tutorialId: f.tutorial.id,
    title: 'Matrix class',
    startsAt: new Date(Date.now() + 7 * 86_400_000),
    durationMinutes: 60,
    place: 'Studio',
    seats: 20,
    kitFeeCents: 0,
    currency: 'USD',
  });
  const r = await Registration.create({
    classId: k.id,
    name: 'Matrix attendee',
    email: 'matrix@attendee.example',
    status: 'confirmed',
    currency: 'USD',
    confirmedAt: new Date(),
  });
  const m = await Material.create({ tutorialId: f.tutorial.id, name: 'Matrix cardstock', sheetWidth: '12 in', sheetHeight: '12 in' });
  Object.assign(cls, { id: k.id, registrationId: r.id, materialId: m.id });
  await TutorialVersion.create({ tutorialId: f.tutorial.id, kind: 'sent_back', content: await draftContent(f.tutorial), createdById: f.users.coordinator.id });
  live = await Tutorial.create({
    studioId: f.studio.id,
    authorId: f.users.maker.id,
    title: 'Live',
    slug: `live-${crypto.randomUUID().slice(0, 8)}`,
    state: 'published',
  });
  brief.id = (await Brief.create({ studioId: f.studio.id, makerId: f.users.maker.id, title: 'Matrix brief', dueDate: '2027-02-01' })).id;
  cmt.id = (await Comment.create({ tutorialId: f.tutorial.id, authorId: f.users.coordinator.id, parentId: null, body: 'Matrix thread' })).id;
  const to = `${crypto.randomUUID()}@elsewhere.example`;
  elsewhere = await OutboxMessage.create({
    messageId: null,
    from: 'studio@cardwright.local',
    to,
    recipients: [to],
    subject: 'Reset',
    text: 'a link',
    html: null,
  });
  for (const who of WHO) {
    if (who === 'anonymous') continue;
    const email = who === 'outsider' ? f.outsider.email : f.users[who].email;
    mine[who] = await OutboxMessage.create({
      messageId: null,
      from: 'studio@cardwright.local',
      to: email,
      recipients: [email],
      subject: 'Yours',
      text: 'hello',
      html: null,
    });
  }
});

describe.each(ROUTES)('$name', (route) => {
  it.each(WHO)('as %s', async (who) => {
    const t = route.fresh
      ? await Tutorial.create({
          studioId: f.studio.id,
          authorId: f.users.maker.id,
          title: 'Doomed',
          slug: `d-${crypto.randomUUID().slice(0, 8)}`,
          state: route.state ?? 'draft',
          ...(route.scheduled ? { publishAt: new Date(Date.now() + 86_400_000), publishTimeZone: 'UTC' } : {}),
        })
      : f.tutorial;
    const c = await f.clientFor(who);
    const url = route.path(f, t, who);
    await Promise.all(freshBriefs.splice(0));
    const res = route.method === 'get' ? await c.get(url).set(route.headers ?? {}) : await c[route.method](url, route.body?.(f));
    expect(res.status, `${route.method.toUpperCase()} ${url} as ${who}: ${JSON.stringify(res.body)}`).toBe(route.expect[who]);
  });
});

/**
 * Resumable uploads (tus 1.0) speak in headers: starting one names the tutorial in Upload-Metadata,
 * and continuing one is for the person who started it. Other makers, students and outsiders get 404.
 */
describe('resumable uploads', () => {
  const b64 = (s: string) => Buffer.from(s).toString('base64');
  const START = { owner: 201, coordinator: 201, maker: 201, student: 403, outsider: 404, anonymous: 401 };
  async function start(who: Who) {
    const c = await f.clientFor(who);
    const token = await c.token();
    return c.agent.post('/api/uploads').set({
      'X-CSRF-Token': token,
      'Tus-Resumable': '1.0.0',
      'Upload-Length': '1000',
      'Upload-Metadata': `tutorialId ${b64(f.tutorial.id)},filename ${b64('a.mp4')}`,
    });
  }
  it.each(WHO)('start one as %s', async (who) => {
    const res = await start(who);
    expect(res.status, JSON.stringify(res.body)).toBe(START[who]);
  });
  const CONTINUE = { owner: 404, coordinator: 404, maker: 204, student: 404, outsider: 404, anonymous: 401 };
  it.each(WHO)("send bytes to the maker's upload as %s", async (who) => {
    const location = (await start('maker')).headers.location as string;
    const c = await f.clientFor(who);
    const token = await c.token();
    const res = await c.agent
      .patch(location)
      .set({ 'X-CSRF-Token': token, 'Tus-Resumable': '1.0.0', 'Upload-Offset': '0', 'Content-Type': 'application/offset+octet-stream' })
      .send(Buffer.concat([Buffer.from('\x00\x00\x00\x20ftypisom\x00\x00\x02\x00isomiso2avc1mp41', 'latin1'), Buffer.alloc(100)]));
    expect(res.status, JSON.stringify(res.body)).toBe(CONTINUE[who]);
    const head = await c.agent.head(location).set({ 'Tus-Resumable': '1.0.0' });
    expect(head.status).toBe(who === 'anonymous' ? 401 : who === 'maker' ? 200 : 404);
  });
});
