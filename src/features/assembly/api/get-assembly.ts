import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AssemblyDto } from '@shared/schemas/assembly';
import { api } from '@/lib/api-client';
import { assemblyKeys } from './keys';

export const getAssembly = (tutorialId: string) => api<AssemblyDto>(`/tutorials/${tutorialId}/assembly`);

/** The proposals so far; polled while stills wait for the video, so they can be accepted as soon as it is read. */
export const assemblyQueryOptions = (tutorialId: string, recordingId: string, hasTranscript: boolean) =>
  queryOptions({
    queryKey: assemblyKeys.detail(tutorialId, recordingId, hasTranscript),
    queryFn: () => getAssembly(tutorialId),
    refetchInterval: (q) => (q.state.data?.proposals.some((p) => p.waiting?.startsWith('Waits for the video')) ? 2000 : false),
  });

export const useAssembly = (tutorialId: string, recordingId: string, hasTranscript: boolean) =>
  useQuery(assemblyQueryOptions(tutorialId, recordingId, hasTranscript));
