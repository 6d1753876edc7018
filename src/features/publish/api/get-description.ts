import { queryOptions, useQuery } from '@tanstack/react-query';
import { exportUrls } from './export-urls';
import { fetchExportText } from './fetch-export';
import { publishKeys } from './keys';

/** The video description as plain text (chapters, supplies, disclosure, the written tutorial's link). */
export const getDescription = (tutorialId: string, signal?: AbortSignal) => fetchExportText(exportUrls.description(tutorialId), signal);
export const descriptionQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: publishKeys.description(tutorialId), queryFn: ({ signal }) => getDescription(tutorialId, signal) });
/** The video description. */
export const useDescription = (tutorialId: string) => useQuery(descriptionQueryOptions(tutorialId));
