import type { OutboxMessageDto, OutboxSummaryDto } from '@shared/schemas/outbox';
import type { OutboxMessage } from '../models';

/** A caught message in a list, without its body. */
export const presentOutboxSummary = (m: OutboxMessage): OutboxSummaryDto => ({
  id: m.id,
  from: m.from,
  to: m.to,
  subject: m.subject,
  createdAt: m.createdAt.toISOString(),
  attachments: m.attachments,
});

/** One caught message with its text and HTML parts. */
export const presentOutboxMessage = (m: OutboxMessage): OutboxMessageDto => ({ ...presentOutboxSummary(m), text: m.text, html: m.html });
