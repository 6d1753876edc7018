import { createHash } from 'node:crypto';
import { blogImageBase } from '../lib/media-urls';
import { loadPublicPage } from './access';
import { loadPublishBundle } from './publish/bundle';
import { blogHtml } from './publish/blog';
import { ensureBlogImages } from './publish/blog-images';
import { publicPageHtml } from './publish/public-page';
import { templateSvg } from './publish/template';

/** A rendered public page with what a browser or a shared cache needs to ask "has it changed?". */
export type PublicPage = { tutorialId: string; html: string; etag: string; lastModified: Date };

// Readers arrive in bursts when a post is shared: the rendered page is kept until something on it
// changes (see public-page-invalidation.ts). A bound on the pages kept; the least recently read go first.
const MAX_PAGES = 500;
const pages = new Map<string, PublicPage>();
const rendering = new Map<string, Promise<PublicPage | null>>();
// Bumped by every invalidation: a render that began before one is served but not kept.
let generation = 0;
// Pages are kept only while this process hears of changes made elsewhere (public-page-invalidation.ts).
let listening = false;

/** Set by the change listener: while it is not connected, every view renders afresh. */
export function setListening(on: boolean): void {
  listening = on;
  dropLocalPublicPage(null);
}

const keyOf = (studioSlug: string, tutorialSlug: string) => `${studioSlug}/${tutorialSlug}`;

/**
 * The public page of a published tutorial (P5), or null when there is none at that address.
 * Served from memory after the first view; publishing, an approved update or any change to what
 * the page shows forgets it, in every app process.
 */
export async function publicPage(studioSlug: string, tutorialSlug: string): Promise<PublicPage | null> {
  const key = keyOf(studioSlug, tutorialSlug);
  const hit = pages.get(key);
  if (hit) {
    pages.delete(key); // re-inserted last: the Map is kept in order of use
    pages.set(key, hit);
    return hit;
  }
  // Thirty readers arriving at once on a cold page wait for one render, not thirty.
  let pending = rendering.get(key);
  if (!pending) {
    const startedAt = generation;
    const render: Promise<PublicPage | null> = renderPublicPage(studioSlug, tutorialSlug)
      .then((page) => {
        if (page && listening && generation === startedAt) keep(key, page);
        return page;
      })
      .finally(() => {
        if (rendering.get(key) === render) rendering.delete(key);
      });
    rendering.set(key, render);
    pending = render;
  }
  return pending;
}

function keep(key: string, page: PublicPage) {
  pages.set(key, page);
  if (pages.size > MAX_PAGES) pages.delete(pages.keys().next().value!);
}

/** Renders the page afresh from the database: the blog article of the tutorial, its images made once. */
export async function renderPublicPage(studioSlug: string, tutorialSlug: string): Promise<PublicPage | null> {
  const found = await loadPublicPage(studioSlug, tutorialSlug);
  if (!found) return null;
  const { tutorial, studio } = found;
  const bundle = await loadPublishBundle(tutorial);
  const blog = await blogHtml(bundle, { imageBase: blogImageBase(tutorial.id) });
  await ensureBlogImages(tutorial.id, blog.images);
  // Everything on the page comes from the published version (never the draft); only the address is live.
  const html = publicPageHtml({
    title: bundle.tutorial.title,
    studioName: studio.name,
    here: `/t/${studio.slug}/${tutorial.slug}`,
    exportsBase: `/api/tutorials/${tutorial.id}/export`,
    // Every page of the SVG template (one file a page), so cutting software gets all the pieces.
    svgPages: bundle.pieces.length ? templateSvg(bundle.pieces, { paper: 'letter', title: bundle.tutorial.title, precision: bundle.precision }).length : 0,
    videoUrl: bundle.tutorial.videoUrl,
    blog,
  });
  // A strong validator from the bytes: two app processes rendering the same page agree on it.
  const etag = `"${createHash('sha256').update(html).digest('base64url').slice(0, 32)}"`;
  const lastModified = new Date(Math.floor(Date.now() / 1000) * 1000);
  return { tutorialId: tutorial.id, html, etag, lastModified };
}

/** Forgets this process's copy of a tutorial's page (null: every page). Other processes hear of it through `forgetPublicPage`. */
export function dropLocalPublicPage(tutorialId: string | null): void {
  generation++;
  // A render under way may have read the old rows: later readers wait for a new one.
  rendering.clear();
  if (tutorialId === null) return pages.clear();
  for (const [key, page] of pages) if (page.tutorialId === tutorialId) pages.delete(key);
}

/** How many pages this process keeps, and whether it hears of other processes' changes (for tests). */
/** What the cache holds now; `generation` counts the drops (a test can tell whether one happened). */
export const publicPageCacheState = () => ({ kept: pages.size, listening, generation });
