import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApiError } from '@/lib/api-client';
import { exportUrls } from './export-urls';
import { fetchExport } from './fetch-export';
import { publishKeys } from './keys';
import type { Paper, TemplateInfo } from './types';

/**
 * How many pages the cutting template takes on this paper (the SVG export's X-Page-Count), or
 * the server's reason there is none: a 409 when the cut list is empty.
 */
export async function getTemplateInfo(tutorialId: string, paper: Paper, signal?: AbortSignal): Promise<TemplateInfo> {
  try {
    const { headers } = await fetchExport(exportUrls.templateSvg(tutorialId, paper, 1), { signal });
    const n = Number(headers.get('x-page-count'));
    return { kind: 'ready', pageCount: Number.isInteger(n) && n > 0 ? n : 1 };
  } catch (e) {
    if (e instanceof ApiError && e.status === 409) return { kind: 'empty', message: e.message };
    throw e;
  }
}
export const templateInfoQueryOptions = (tutorialId: string, paper: Paper) =>
  queryOptions({ queryKey: publishKeys.template(tutorialId, paper), queryFn: ({ signal }) => getTemplateInfo(tutorialId, paper, signal) });
/** The template's page count on one paper, or why it is empty. */
export const useTemplateInfo = (tutorialId: string, paper: Paper) => useQuery(templateInfoQueryOptions(tutorialId, paper));
