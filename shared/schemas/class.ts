import { z } from 'zod';
import { isCurrency } from '../money';
import { paperSchema, type Paper } from './publish';
import type { PieceShape } from './piece';

export const CLASS_STATUSES = ['scheduled', 'cancelled'] as const;
export type ClassStatus = (typeof CLASS_STATUSES)[number];

/** A registration's states (fixed: outside tools read them). */
export const REGISTRATION_STATUSES = ['awaiting_payment', 'confirmed', 'waitlisted', 'cancelled', 'refunded', 'expired'] as const;
export type RegistrationStatus = (typeof REGISTRATION_STATUSES)[number];

/** Words the roster and the attendee's page show for each state. */
export const REGISTRATION_STATUS_LABELS: Record<RegistrationStatus, string> = {
  awaiting_payment: 'awaiting payment',
  confirmed: 'paid',
  waitlisted: 'waiting list',
  cancelled: 'cancelled',
  refunded: 'refunded',
  expired: 'expired',
};

/** A time with its offset, as ISO 8601 writes it: 2027-03-14T18:30:00-05:00 or ...Z. */
export const isoWithOffset = z.iso.datetime({ offset: true, message: 'Use a date and time with its offset, like 2027-03-14T18:30:00-05:00' });

/** An IANA time zone name this runtime knows (Europe/London, America/Chicago). */
export const timeZoneSchema = z
  .string()
  .trim()
  .min(1)
  .max(80)
  .refine((tz) => {
    try {
      new Intl.DateTimeFormat('en', { timeZone: tz });
      return true;
    } catch {
      return false;
    }
  }, 'Not a time zone this server knows, like Europe/London or America/Chicago');
const timeZone = timeZoneSchema;

export const currencySchema = z.string().trim().toUpperCase().refine(isCurrency, 'Use a three-letter currency code, like USD, EUR or GBP');

const classFields = {
  title: z.string().trim().min(1, 'Give the class a title').max(160, 'Keep the title under 160 characters'),
  startsAt: isoWithOffset,
  timeZone,
  durationMinutes: z
    .number()
    .int('Use whole minutes')
    .min(15, 'At least 15 minutes')
    .max(24 * 60, 'At most 24 hours'),
  place: z.string().trim().min(1, 'Say where the class meets: an address or a video-call link').max(500),
  seats: z.number().int('Use a whole number').min(1, 'At least 1 seat').max(500, 'At most 500 seats'),
  spares: z.number().int('Use a whole number').min(0).max(100, 'At most 100 spare kits'),
  kitFeeCents: z.number().int('Give the fee in minor units (cents), a whole number').min(0, 'The fee cannot be negative').max(1_000_000, 'At most 10,000.00'),
  currency: currencySchema,
  whatToBring: z.string().trim().max(2000),
  cancellationDeadline: isoWithOffset.nullable(),
  cautions: z.string().trim().max(4000).nullable(),
  paper: paperSchema,
};

/** POST /tutorials/:id/classes (the shape outside tools rely on; the rest has defaults). */
export const createClassSchema = z
  .object({
    ...classFields,
    title: classFields.title.optional(),
    timeZone: classFields.timeZone.default('UTC'),
    spares: classFields.spares.default(1),
    whatToBring: classFields.whatToBring.default(''),
    cancellationDeadline: classFields.cancellationDeadline.optional(),
    cautions: classFields.cautions.optional(),
    paper: classFields.paper.default('letter'),
  })
  .refine((c) => !c.cancellationDeadline || Date.parse(c.cancellationDeadline) <= Date.parse(c.startsAt), {
    path: ['cancellationDeadline'],
    message: 'The cancellation deadline must be before the class starts',
  });
export type CreateClassInput = z.input<typeof createClassSchema>;

/** PATCH /classes/:id: any field. */
export const updateClassSchema = z
  .object(classFields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type UpdateClassInput = z.input<typeof updateClassSchema>;

/** POST /classes/:id/registrations: no account needed. */
export const registerSchema = z.object({
  name: z.string().trim().min(1, 'Enter your name').max(120, 'Keep the name under 120 characters'),
  email: z.string().trim().toLowerCase().pipe(z.email('Enter an e-mail address')),
});
export type RegisterInput = z.input<typeof registerSchema>;

/** The token of an attendee's link (their e-mail carries it), in the query of a GET or the body of a POST. */
export const registrationTokenSchema = z.object({ token: z.string().min(10, 'The link is incomplete').max(200) });

/** The teacher cancels one registration, refunding the kit fee or not. */
export const staffCancelSchema = z.object({ refund: z.boolean().default(true) });
export const checkInSchema = z.object({ checkedIn: z.boolean() });
export const messageAllSchema = z.object({
  subject: z.string().trim().min(1, 'Give the message a subject').max(200),
  body: z.string().trim().min(1, 'Write the message').max(10_000),
});
export type MessageAllInput = z.input<typeof messageAllSchema>;

export const registrationParams = z.object({ id: z.uuid('Not a valid id'), registrationId: z.uuid('Not a valid id') });
export const publicClassParams = z.object({ studio: z.string().min(1).max(200), id: z.uuid('Not a valid id') });
export const kitsQuery = z.object({ paper: paperSchema.default('letter') });

/** A material's price per stock sheet (kit planner); null clears it. */
export const materialPriceSchema = z.object({
  sheetPriceCents: z.number().int('Give the price in minor units (cents)').min(0).max(1_000_000).nullable(),
  sheetPriceCurrency: currencySchema.nullable(),
});

// Response shapes (DTOs): the server's presenters return them, the client reads them.

export type ClassAbilitiesDto = { read: boolean; update: boolean; manageRoster: boolean };

/** A class as the public page shows it: no roster. */
export type PublicClassDto = {
  id: string;
  studio: { name: string; slug: string };
  tutorial: { title: string; publicUrl: string | null };
  title: string;
  startsAt: string;
  endsAt: string;
  timeZone: string;
  /** "Saturday, March 14, 2027, 6:30 PM – 8:00 PM CDT" in the class's time zone. */
  when: string;
  durationMinutes: number;
  place: string;
  placeIsLink: boolean;
  seats: number;
  seatsLeft: number;
  waitlisted: number;
  kitFeeCents: number;
  currency: string;
  fee: string;
  whatToBring: string;
  cancellationDeadline: string | null;
  cautions: string[];
  status: ClassStatus;
  /** open: seats left; full: joins the waiting list; closed: past, started or cancelled (with why). */
  registration: { state: 'open' | 'full' | 'closed'; reason: string | null };
  publicPath: string;
};

export type RegistrationRowDto = {
  id: string;
  name: string;
  email: string;
  status: RegistrationStatus;
  endReason: string | null;
  amountCents: number;
  currency: string;
  holdExpiresAt: string | null;
  offeredAt: string | null;
  paidAt: string | null;
  checkedIn: boolean;
  createdAt: string;
  /** Place on the waiting list, from 1; null when not waiting. */
  waitlistPlace: number | null;
};

/** GET /classes/:id: the class with its roster (staff). */
export type ClassDto = Omit<PublicClassDto, 'cautions'> & {
  studioId: string;
  tutorialId: string;
  seatsTaken: number;
  spares: number;
  paper: Paper;
  /** The wording shown (the teacher's own or the default), one caution a line. */
  cautions: string[];
  cautionsCustom: boolean;
  defaultCautions: string[];
  publicUrl: string;
  registrations: RegistrationRowDto[];
  abilities: ClassAbilitiesDto;
};

/** A class in a list. */
export type ClassSummaryDto = Pick<
  ClassDto,
  | 'id'
  | 'title'
  | 'startsAt'
  | 'when'
  | 'timeZone'
  | 'place'
  | 'seats'
  | 'seatsTaken'
  | 'status'
  | 'kitFeeCents'
  | 'currency'
  | 'fee'
  | 'tutorialId'
  | 'publicPath'
> & { tutorialTitle: string; waitlisted: number; past: boolean };

export type ClassListDto = { classes: ClassSummaryDto[]; abilities: { schedule: boolean } };

/** POST /classes/:id/registrations. */
export type RegistrationCreatedDto = { id: string; status: RegistrationStatus; checkoutUrl?: string; registrationUrl: string; message: string };

/** GET /registrations/:id?token=: the attendee's own view. */
export type RegistrationDto = {
  id: string;
  status: RegistrationStatus;
  name: string;
  email: string;
  endReason: string | null;
  holdExpiresAt: string | null;
  waitlistPlace: number | null;
  amountCents: number;
  currency: string;
  fee: string;
  canPay: boolean;
  canCancel: boolean;
  /** Why cancelling is not possible now (the deadline passed ...). */
  cancelNote: string | null;
  /** The words the page leads with. */
  message: string;
  class: PublicClassDto;
  handoutUrl: string | null;
  calendarUrl: string | null;
};

/** A class of the signed-in attendee (the student's "Your classes"). */
export type MyClassDto = {
  registrationId: string;
  status: RegistrationStatus;
  class: PublicClassDto;
  registrationUrl: string;
  handoutUrl: string | null;
  tutorialUrl: string | null;
};
export type MyClassesDto = { classes: MyClassDto[] };

/** One row of the pre-cut checklist: a piece, how many per kit and in all, its size in inches and millimetres. */
export type KitPieceDto = { name: string; material: string; perKit: number; total: number; sizeInches: string; sizeMm: string; shape: PieceShape };

export type KitMaterialDto = {
  material: string;
  materialId: string | null;
  sheetLabel: string;
  sheets: number;
  sheetPriceCents: number | null;
  sheetPriceCurrency: string | null;
  /** sheets x price, when the price is in the class's currency. */
  costCents: number | null;
  /** Why the cost is not counted (no price yet, another currency). */
  costNote: string | null;
  errors: string[];
};

/** GET /classes/:id/kit-plan. */
export type KitPlanDto = {
  classId: string;
  seats: number;
  spares: number;
  kits: number;
  currency: string;
  kitFeeCents: number;
  empty: boolean;
  /** What to do when there is nothing to plan. */
  emptyMessage: string | null;
  pieces: KitPieceDto[];
  materials: KitMaterialDto[];
  /** Sum of the priced materials. */
  totalCostCents: number;
  /** Total / kits (spares included), rounded half up to the minor unit. */
  costPerKitCents: number;
  /** Fee x seats - total cost: spares are paid for by the seats. */
  marginCents: number;
  marginPerSeatCents: number;
  /** Every material has a price in the class's currency. */
  complete: boolean;
  working: string[];
};

/** POST /classes/:id/messages. */
export type MessagesSentDto = { sent: number; message: string };
/** POST /registrations/:id/checkout: where to pay (null when there is nothing to pay). */
export type CheckoutStartedDto = { checkoutUrl: string | null; status: RegistrationStatus };
/** POST /registrations/:id/cancel. */
export type RegistrationCancelledDto = { id: string; status: RegistrationStatus };
