/** A message in the person's Outbox list (`GET /api/outbox`): only mail addressed to them. */
export type OutboxSummaryDto = {
  id: string;
  from: string;
  to: string;
  subject: string;
  createdAt: string;
  attachments: { filename: string; contentType: string; size: number }[];
};
/** One message (`GET /api/outbox/:id`), plain text and the HTML part as sent. */
export type OutboxMessageDto = OutboxSummaryDto & { text: string; html: string | null };
/** GET /api/outbox. */
export type OutboxDto = { messages: OutboxSummaryDto[] };
/** GET /api/outbox/:id. */
export type OutboxEntryDto = { message: OutboxMessageDto };
