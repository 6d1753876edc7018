import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { footageKeys } from './keys';
import type { RecordingDto } from '@shared/schemas/footage';

const working = (r: RecordingDto | undefined) => r?.status === 'uploaded' || r?.status === 'processing';

/** One recording with the caller's abilities. */
export const getRecording = (id: string) => api<RecordingDto>(`/recordings/${id}`);

/** Polls every second while the server is still preparing the footage, then stops. */
export const recordingQueryOptions = (id: string) =>
  queryOptions({
    queryKey: footageKeys.recording(id),
    queryFn: () => getRecording(id),
    refetchInterval: (query) => (working(query.state.data) ? 1000 : false),
    staleTime: 0,
  });
