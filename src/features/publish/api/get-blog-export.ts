import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApiError } from '@/lib/api-client';
import { exportUrls } from './export-urls';
import { publishKeys } from './keys';
import type { BlogExportDto } from '@shared/schemas/publish';

/** The blog post's article fragment, its words as text and its HowTo JSON-LD, for "Copy HTML". */
export async function getBlogExport(tutorialId: string, signal?: AbortSignal): Promise<BlogExportDto> {
  let res: Response;
  try {
    res = await fetch(exportUrls.blogJson(tutorialId), { credentials: 'same-origin', headers: { Accept: 'application/json' }, signal });
  } catch (e) {
    if ((e as Error).name === 'AbortError') throw e;
    throw new ApiError(0, 'Cannot reach the server; check your connection and try again');
  }
  const body = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (!res.ok) throw new ApiError(res.status, String(body.error ?? res.statusText), [], body);
  return body as BlogExportDto;
}
export const blogExportQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: publishKeys.blog(tutorialId), queryFn: ({ signal }) => getBlogExport(tutorialId, signal) });
/** The blog export as JSON. */
export const useBlogExport = (tutorialId: string) => useQuery(blogExportQueryOptions(tutorialId));
