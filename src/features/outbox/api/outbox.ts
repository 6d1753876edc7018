import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OutboxDto, OutboxEntryDto } from '@shared/schemas/outbox';

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
  detail: (id: string) => [...outboxKeys.all, 'detail', id] as const,
};

/** The signed-in person's own mail, as the local fake caught it. */
export const getOutbox = () => api<OutboxDto>('/outbox');
export const outboxQueryOptions = () => queryOptions({ queryKey: outboxKeys.list(), queryFn: getOutbox, refetchInterval: 5000 });
export const useOutbox = () => useQuery(outboxQueryOptions());

export const getOutboxMessage = (id: string) => api<OutboxEntryDto>(`/outbox/${id}`);
export const useOutboxMessage = (id: string) => useQuery(queryOptions({ queryKey: outboxKeys.detail(id), queryFn: () => getOutboxMessage(id) }));

/** Deletes one of the person's messages. */
export const deleteOutboxMessage = (id: string) => api<void>(`/outbox/${id}`, { method: 'DELETE' });
export const useDeleteOutboxMessage = () => {
  const qc = useQueryClient();
  return useMutation({ mutationFn: deleteOutboxMessage, onSuccess: () => qc.invalidateQueries({ queryKey: outboxKeys.all }) });
};
