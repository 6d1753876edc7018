import { z } from 'zod';
import { COMMON_PASSWORDS } from './common-passwords';
import type { Role } from './roles';

const utf8Length = (s: string) => new TextEncoder().encode(s).length;

/**
 * Passwords per NIST SP 800-63B-4: at least 15 characters, no composition rules, common ones refused.
 * bcrypt reads only 72 bytes (OWASP Password Storage), so longer ones are refused rather than cut.
 */
export const passwordSchema = z
  .string()
  .min(15, 'Use at least 15 characters (a few words in a row work well)')
  .refine((s) => utf8Length(s) <= 72, 'Use at most 72 bytes (about 72 plain letters)')
  .refine((s) => !COMMON_PASSWORDS.has(s.toLowerCase()), 'That password is too common; pick another');

export const emailSchema = z.string().trim().toLowerCase().pipe(z.email('Enter an e-mail address'));

export const signUpSchema = z.object({
  name: z.string().trim().min(1, 'Enter your name').max(120),
  email: emailSchema,
  password: passwordSchema,
  studioName: z.string().trim().min(1, 'Name your studio').max(120).optional(),
  invitationToken: z.string().min(10).optional(),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const resetRequestSchema = z.object({ email: emailSchema });
export const resetSchema = z.object({ token: z.string().min(10, 'The link is incomplete'), password: passwordSchema });
export type ResetRequestInput = z.input<typeof resetRequestSchema>;
export type ResetInput = z.input<typeof resetSchema>;
/** `POST /api/auth/password`: a signed-in person changes their password, proving the current one. */
export const changePasswordSchema = z
  .object({ currentPassword: z.string().min(1, 'Enter your current password').max(200), password: passwordSchema })
  .refine((v) => v.password !== v.currentPassword, { path: ['password'], message: 'That is your current password; choose a new one' });
export type ChangePasswordInput = z.input<typeof changePasswordSchema>;
export const acceptInvitationSchema = z.object({ token: z.string().min(10) });

/** A studio the signed-in person belongs to, with their role there and what the navigation offers (the studio policy decides). */
export type StudioMembershipDto = { id: string; name: string; slug: string; role: Role; abilities: { listClasses: boolean; readBoard: boolean } };
/**
 * `GET /api/auth/me`: the signed-in person and their studios. `outbox`: mail goes to the local fake,
 * so the person's own mail can be read in the app; `devMailbox`: this request may open the
 * development mailbox of every caught message (loopback, never in production).
 */
export type MeDto = { user: { id: string; email: string; name: string }; studios: StudioMembershipDto[]; outbox: boolean; devMailbox: boolean };
/** `GET /api/auth/session`: the signed-in person, or null for a visitor. */
export type SessionDto = { me: MeDto | null };
/** `GET /api/invitations/:token`: what the invitation page shows before accepting. */
export type InvitationPreviewDto = { email: string; role: Role; studio: { id: string; name: string }; hasAccount: boolean; expiresAt: string };
/** `POST /api/invitations/accept`. */
export type InvitationAcceptedDto = { studioId: string; studios: StudioMembershipDto[] };
/** `GET /api/auth/demo`: the demo people the sign-in page lists while the demo studio exists. */
export type DemoDto = { present: boolean; password?: string; people: { email: string; name: string; role: Role }[] };
/** Sign-up, sign-in, a password reset or change: the person, and the CSRF token of their new session. */
export type SignedInDto = MeDto & { csrfToken: string };
/** `POST /api/auth/reset-request`: the same sentence whether or not the address has an account. */
export type ResetRequestedDto = { message: string };
