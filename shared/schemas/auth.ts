import { z } from 'zod';
import { COMMON_PASSWORDS } from './common-passwords';

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
export const acceptInvitationSchema = z.object({ token: z.string().min(10) });
