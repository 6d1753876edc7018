import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { exportUrls } from './export-urls';
import { publishKeys } from './keys';
import type { Paper, TemplateInfoDto as TemplateInfo } from '@shared/schemas/publish';

/** How many pages the cutting template takes on this paper, or the server's reason there is none. */
export async function getTemplateInfo(tutorialId: string, paper: Paper, signal?: AbortSignal): Promise<TemplateInfo> {
  return api<TemplateInfo>(exportUrls.templateInfo(tutorialId, paper), { signal });
}
export const templateInfoQueryOptions = (tutorialId: string, paper: Paper) =>
  queryOptions({ queryKey: publishKeys.template(tutorialId, paper), queryFn: ({ signal }) => getTemplateInfo(tutorialId, paper, signal) });
/** The template's page count on one paper, or why it is empty. */
export const useTemplateInfo = (tutorialId: string, paper: Paper) => useQuery(templateInfoQueryOptions(tutorialId, paper));
