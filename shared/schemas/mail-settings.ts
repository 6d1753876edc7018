import { z } from 'zod';

/** The kinds of e-mail a person can turn off, per studio (every kind is on until they do). */
export const MAIL_KINDS = ['stateMoves', 'comments', 'replies', 'mentions', 'assignments', 'scheduledPublish', 'classMail'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];
export const mailKindSchema = z.enum(MAIL_KINDS);

/** What the settings page says about each kind. */
export const MAIL_KIND_LABELS: Record<MailKind, { label: string; hint: string }> = {
  stateMoves: { label: 'Review moves', hint: 'A tutorial is sent for review, approved, sent back, published or unpublished' },
  comments: { label: 'New comments', hint: 'Someone comments on a tutorial you make or review' },
  replies: { label: 'Replies', hint: 'Someone replies in a thread you are part of' },
  mentions: { label: 'Mentions', hint: 'Someone mentions you with @ in a comment' },
  assignments: { label: 'Briefs', hint: 'A coordinator gives you a brief, or changes one' },
  scheduledPublish: { label: 'Scheduled publishing', hint: 'A tutorial set to publish on a date goes out' },
  classMail: { label: 'Class messages', hint: 'Messages from the teacher of a class you registered for (mail about your seat and payment always comes)' },
};

/** PUT /studios/:id/mail-settings: the kinds to change, each on (true) or off (false). */
export const updateMailSettingsSchema = z.partialRecord(mailKindSchema, z.boolean()).refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type UpdateMailSettingsInput = z.infer<typeof updateMailSettingsSchema>;

// Response shapes (DTOs).

export type MailSettingsDto = { studioId: string; kinds: { kind: MailKind; label: string; hint: string; enabled: boolean }[] };
