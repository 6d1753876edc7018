import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
  detail: (id: string) => [...outboxKeys.all, 'detail', id] as const,
};

export type OutboxSummary = { id: string; from: string; to: string; subject: string; createdAt: string; attachments: { filename: string; size: number }[] };
export type OutboxMessage = OutboxSummary & { text: string; html: string | null };

export const getOutbox = () => api<{ messages: OutboxSummary[] }>('/outbox');
export const outboxQueryOptions = () => queryOptions({ queryKey: outboxKeys.list(), queryFn: getOutbox, refetchInterval: 5000 });
export const useOutbox = () => useQuery(outboxQueryOptions());

export const getOutboxMessage = (id: string) => api<{ message: OutboxMessage }>(`/outbox/${id}`);
export const useOutboxMessage = (id: string) => useQuery(queryOptions({ queryKey: outboxKeys.detail(id), queryFn: () => getOutboxMessage(id) }));
