/**
 * The blog-ready page (P1): the write-up rendered by the shared renderer (shared/editor
 * renderDocHtml) with resized stills, wrapped with the title and one JSON-LD block of
 * schema.org HowTo; as a fragment for "copy HTML" and as a zip of index.html and images/.
 */
import { createRequire } from 'node:module';
import type { JSONContent } from '@tiptap/core';
import type { Archiver, ZipOptions } from 'archiver';
import { escapeHtml, renderDocHtml } from '@shared/editor/render-html';
import { plainText } from '@shared/editor/render-parts';
import { palette } from '@shared/palette';
import { blocksText, docSteps, introText, stillsIn } from './doc-parts';
import { blogVariants, imageSize, renderBlogImage, type BlogImage } from './images';
import { toRenderPieces, toRenderSupplies } from './render-inputs';
import type { PublishBundle, PublishStill } from './types';
import { endSentence } from '@shared/sentence';

export interface BlogOptions {
  /** Prefix of image addresses in the HTML: "images/" in the zip, the media URL prefix for the clipboard. */
  imageBase: string;
  /** The page's language (default "en"). */
  lang?: string;
}

export interface BlogResult {
  /** The article fragment for "copy HTML": title, write-up, and the JSON-LD script. */
  html: string;
  /** The same article in a complete HTML5 document (index.html of the zip). */
  page: string;
  /** The schema.org HowTo object embedded in both. */
  jsonLd: Record<string, unknown>;
  /** The stills the page shows, with the files to make for each. */
  images: BlogImage[];
}

// archiver 7 exports a factory function; the installed @types/archiver 8 describes archiver 8's
// classes instead, so the factory is loaded through require and typed here.
const archiver = createRequire(import.meta.url)('archiver') as (format: 'zip', options?: ZipOptions) => Archiver;

// Stand-in image host while the shared renderer runs: it accepts only /media/ or absolute
// http(s) addresses, and "images/..." in the zip is neither. Swapped for the real prefix after.
const PLACEHOLDER = 'https://publish-image.invalid/';

function safeName(id: string): string {
  return id.replace(/[^A-Za-z0-9_-]/g, '-').slice(0, 64) || 'still';
}

/** ISO 8601 duration for schema.org totalTime: 90 -> "PT1H30M". */
export function isoDuration(minutes: number): string {
  const total = Math.round(minutes);
  const h = Math.floor(total / 60);
  const m = total % 60;
  return `PT${h ? `${h}H` : ''}${m || !h ? `${m}M` : ''}`;
}

/** JSON that cannot close its script element or start markup (`<`, `>`, `&` and line separators escaped). */
function scriptJson(value: unknown): string {
  return JSON.stringify(value)
    .replace(/</g, '\\u003c')
    .replace(/>/g, '\\u003e')
    .replace(/&/g, '\\u0026')
    .replace(/\u2028/g, '\\u2028')
    .replace(/\u2029/g, '\\u2029');
}

const textNode = (t: string): JSONContent => ({ type: 'text', text: t });
const h2 = (t: string): JSONContent => ({ type: 'heading', attrs: { level: 2 }, content: [textNode(t)] });

/**
 * The document as the page shows it: the title heading dropped (the page has its own h1),
 * a section heading before the steps and live lists when the writer left none (so headings
 * never skip a level), the supplies and cut list added when the write-up lacks them, and each
 * still pointed at its resized copy with a size and a non-empty alt text.
 */
function prepareDoc(bundle: PublishBundle, images: Map<string, BlogImage>): JSONContent {
  const source = bundle.doc?.type === 'doc' ? (bundle.doc.content ?? []) : [];
  const stillsById = new Map(bundle.stills.map((s) => [s.id, s]));
  const title = bundle.tutorial.title.trim();
  const top: JSONContent[] = [];
  const hasType = (t: string) => source.some((n) => n.type === t);
  let stepsSeen = false;

  const fixStill = (n: JSONContent, context: string): JSONContent | null => {
    const a = { ...(n.attrs ?? {}) } as Record<string, unknown>;
    const id = typeof a.stillId === 'string' ? a.stillId : null;
    const still = id ? stillsById.get(id) : undefined;
    const image = id ? images.get(id) : undefined;
    const str = (v: unknown) => (typeof v === 'string' ? v.trim() : '');
    const caption = str(a.caption) || still?.caption.trim() || '';
    const alt = str(a.alt) || still?.alt.trim() || caption || context;
    if (image) return { type: 'still', attrs: { ...a, src: `${PLACEHOLDER}${image.name}`, alt, caption, width: image.width, height: image.height } };
    // A photo from elsewhere on the web keeps its address; one of our stills that is not in
    // the bundle (deleted since) would be a broken image, so it is left out.
    if (!id && typeof a.src === 'string' && /^https?:\/\//i.test(a.src)) return { type: 'still', attrs: { ...a, alt, caption } };
    return null;
  };
  const walk = (nodes: readonly JSONContent[] | undefined, context: string): JSONContent[] => {
    const out: JSONContent[] = [];
    for (const n of nodes ?? []) {
      if (n.type === 'still') {
        const s = fixStill(n, context);
        if (s) out.push(s);
      } else if (n.content) out.push({ ...n, content: walk(n.content, context) });
      else out.push(n);
    }
    return out;
  };

  let stepNumber = 0;
  for (let i = 0; i < source.length; i++) {
    const n = source[i]!;
    const prev = top[top.length - 1];
    const afterHeading = prev?.type === 'heading';
    if (n.type === 'heading' && n.attrs?.level === 1) {
      // The page's h1 is the title; another h1 in the write-up becomes a section.
      if (plainText(n).trim() === title || i === 0) continue;
      top.push({ ...n, attrs: { ...n.attrs, level: 2 } });
      continue;
    }
    if (n.type === 'step') {
      if (!stepsSeen) {
        if (!hasType('supplyList') && bundle.supplies.length) top.push(h2('Supplies'), { type: 'supplyList', attrs: { grouped: true } });
        if (!hasType('cutList') && bundle.pieces.length) top.push(h2('Cut list'), { type: 'cutList', attrs: { units: 'both' } });
        if (top[top.length - 1]?.type !== 'heading') top.push(h2('Steps'));
      }
      stepsSeen = true;
      stepNumber++;
      const first = n.content?.[0];
      const stepTitle = (first?.type === 'stepTitle' ? plainText(first).trim() : '') || `Step ${stepNumber}`;
      top.push({ ...n, content: walk(n.content, stepTitle) });
      continue;
    }
    if ((n.type === 'supplyList' || n.type === 'cutList') && !afterHeading) top.push(h2(n.type === 'supplyList' ? 'Supplies' : 'Cut list'));
    if (n.type === 'still') {
      const s = fixStill(n, title);
      if (s) top.push(s);
      continue;
    }
    top.push(n.content ? { ...n, content: walk(n.content, title) } : n);
  }
  if (!stepsSeen) {
    if (!hasType('supplyList') && bundle.supplies.length) top.push(h2('Supplies'), { type: 'supplyList', attrs: { grouped: true } });
    if (!hasType('cutList') && bundle.pieces.length) top.push(h2('Cut list'), { type: 'cutList', attrs: { units: 'both' } });
  }
  return { type: 'doc', content: top };
}

/** Every still the page shows (by id, first use first), plus the cover (the first still) for the JSON-LD image. */
async function collectImages(bundle: PublishBundle): Promise<Map<string, BlogImage>> {
  const byId = new Map(bundle.stills.map((s) => [s.id, s]));
  const wanted: PublishStill[] = [];
  const add = (s: PublishStill | undefined) => {
    if (s && !wanted.includes(s)) wanted.push(s);
  };
  for (const n of stillsIn(bundle.doc?.content)) add(typeof n.attrs?.stillId === 'string' ? byId.get(n.attrs.stillId) : undefined);
  add(bundle.stills[0]);
  const out = new Map<string, BlogImage>();
  const used = new Set<string>();
  for (const s of wanted) {
    const size = await imageSize(s.file);
    let base = `${safeName(bundle.tutorial.slug || 'tutorial')}-${safeName(s.id)}`;
    for (let k = 2; used.has(base); k++) base = `${base}-${k}`;
    used.add(base);
    const srcset = blogVariants(size, base);
    const main = srcset[srcset.length - 1]!;
    out.set(s.id, { still: s.id, file: s.file, name: main.name, width: main.width, height: main.height, srcset });
  }
  return out;
}

function howTo(bundle: PublishBundle, images: Map<string, BlogImage>, imageBase: string): Record<string, unknown> {
  const { tutorial } = bundle;
  const url = (name: string) => `${imageBase}${name}`;
  const description = introText(bundle.doc) || endSentence(`${tutorial.title}: a step-by-step paper craft tutorial by ${tutorial.authorName}`);
  const cover = bundle.stills[0] ? images.get(bundle.stills[0].id) : undefined;
  const isTool = (c: string) => c.trim().toLowerCase() === 'tool';
  const quantity = (q: string) => (q.trim() ? { requiredQuantity: q.trim() } : {});
  const steps = docSteps(bundle.doc).map((s) => {
    const first = stillsIn(s.body)
      .map((n) => (typeof n.attrs?.stillId === 'string' ? images.get(n.attrs.stillId) : undefined))
      .find(Boolean);
    return {
      '@type': 'HowToStep',
      position: s.number,
      name: s.title,
      text: blocksText(s.body) || s.title,
      ...(first ? { image: url(first.name) } : {}),
      ...(tutorial.publicUrl ? { url: `${tutorial.publicUrl.split('#')[0]}#step-${s.number}` } : {}),
    };
  });
  const ld: Record<string, unknown> = {
    '@context': 'https://schema.org',
    '@type': 'HowTo',
    name: tutorial.title,
    description,
    ...(cover ? { image: url(cover.name) } : {}),
    ...(tutorial.totalTimeMinutes && tutorial.totalTimeMinutes > 0 ? { totalTime: isoDuration(tutorial.totalTimeMinutes) } : {}),
    author: { '@type': 'Person', name: tutorial.authorName },
    ...(tutorial.publicUrl ? { url: tutorial.publicUrl } : {}),
    supply: bundle.supplies.filter((s) => !isTool(s.category)).map((s) => ({ '@type': 'HowToSupply', name: s.name, ...quantity(s.quantity) })),
    tool: bundle.supplies.filter((s) => isTool(s.category)).map((s) => ({ '@type': 'HowToTool', name: s.name, ...quantity(s.quantity) })),
    step: steps,
  };
  return ld;
}

const c = palette;
const PAGE_STYLE = [
  `body{margin:0;background:${c.paper};color:${c.ink};font:17px/1.6 Merriweather,Georgia,serif}`,
  'article{max-width:44rem;margin:0 auto;padding:2rem 1rem}',
  'img{max-width:100%;height:auto}',
  `figure{margin:1rem 0}figcaption,.cw-byline,.cw-note,.cw-mm,.cw-step-time,.cw-sponsored{color:${c.pencil};font-size:.85em}`,
  `table{border-collapse:collapse;width:100%;font-size:.9em}th,td{border-bottom:1px solid ${c.rule};padding:.3rem .4rem;text-align:left;vertical-align:top}`,
  `aside{border-left:3px solid ${c.sage};padding:.2rem 1rem;margin:1rem 0}aside.cw-caution{border-color:${c.rosehip}}`,
  `.cw-disclosure{font-style:italic}a{color:${c.kraftDeep}}`,
].join('');

/**
 * The blog page for a tutorial: the article fragment (for "copy HTML"), the full page, the
 * schema.org HowTo JSON-LD, and the images to make. Image addresses are `${imageBase}${name}`.
 * Reads only the stills' headers; the files themselves are made by renderBlogImage.
 */
export async function blogHtml(bundle: PublishBundle, options: BlogOptions): Promise<BlogResult> {
  const images = await collectImages(bundle);
  const doc = prepareDoc(bundle, images);
  const { tutorial } = bundle;
  const body = renderDocHtml(doc, {
    pieces: toRenderPieces(bundle.pieces, bundle.precision),
    supplies: toRenderSupplies(bundle.supplies),
    precision: bundle.precision,
    ...(tutorial.videoUrl ? { videoUrl: tutorial.videoUrl } : {}),
    ...(bundle.disclosure?.trim() ? { disclosure: bundle.disclosure.trim() } : {}),
  });
  const byName = new Map([...images.values()].map((i) => [i.name, i]));
  const base = options.imageBase;
  const withImages = body.replace(/src="https:\/\/publish-image\.invalid\/([^"]+)"/g, (_m, name: string) => {
    const image = byName.get(name);
    if (!image) return `src="${escapeHtml(base + name)}"`;
    const src = `src="${escapeHtml(base + image.name)}"`;
    if (image.srcset.length < 2) return src;
    const set = image.srcset.map((v) => `${base}${v.name} ${v.width}w`).join(', ');
    return `${src} srcset="${escapeHtml(set)}" sizes="${escapeHtml(`(max-width: ${image.width}px) 100vw, ${image.width}px`)}"`;
  });
  const jsonLd = howTo(bundle, images, base);
  // Every aside is a landmark, and several need distinct names (WAI-ARIA landmark rules, the
  // html-validate "unique-landmark" rule): "Tip 1", "Caution 2".
  const counts = { tip: 0, caution: 0 };
  const named = withImages.replace(/<aside class="cw-(tip|caution)">/g, (_m, kind: 'tip' | 'caution') => {
    const label = `${kind === 'tip' ? 'Tip' : 'Caution'} ${++counts[kind]}`;
    return `<aside class="cw-${kind}" aria-label="${label}">`;
  });
  const byline = [tutorial.authorName, tutorial.studioName]
    .map((s) => s.trim())
    .filter(Boolean)
    .join(', ');
  const html =
    `<article class="cw-tutorial"><h1>${escapeHtml(tutorial.title)}</h1>` +
    (byline ? `<p class="cw-byline">By ${escapeHtml(byline)}</p>` : '') +
    named +
    `<script type="application/ld+json">${scriptJson(jsonLd)}</script></article>`;
  const lang = options.lang && /^[A-Za-z]{2,3}(?:-[A-Za-z0-9]{2,8})*$/.test(options.lang) ? options.lang : 'en';
  const description = String(jsonLd.description ?? '').slice(0, 300);
  const page =
    `<!DOCTYPE html>\n<html lang="${lang}">\n<head>\n<meta charset="utf-8">\n` +
    `<meta name="viewport" content="width=device-width, initial-scale=1">\n` +
    `<title>${escapeHtml(tutorial.title)}</title>\n` +
    `<meta name="description" content="${escapeHtml(description)}">\n` +
    `<style>${PAGE_STYLE}</style>\n</head>\n<body>\n${html}\n</body>\n</html>\n`;
  return { html, page, jsonLd, images: [...images.values()] };
}

/** Runs `tasks` with at most `limit` at a time; the results come back in the tasks' order. */
function inOrder<T>(tasks: readonly (() => Promise<T>)[], limit: number): Promise<T>[] {
  const results: Promise<T>[] = [];
  for (let i = 0; i < tasks.length; i++) {
    // Task i waits for task i - limit, so no more than `limit` run at once.
    const gate =
      i >= limit
        ? results[i - limit]!.then(
            () => undefined,
            () => undefined,
          )
        : Promise.resolve();
    const p = gate.then(tasks[i]!);
    // Failures are reported by whoever awaits them; this only keeps an abandoned one from being "unhandled".
    p.catch(() => undefined);
    results.push(p);
  }
  return results;
}

/**
 * Writes a zip of the blog page to `out`: index.html (images at "images/...") and the
 * resized stills under images/. Resolves once `out` has everything.
 */
export async function blogZip(bundle: PublishBundle, out: NodeJS.WritableStream, options: { lang?: string } = {}): Promise<void> {
  const result = await blogHtml(bundle, { imageBase: 'images/', ...options });
  const archive = archiver('zip', { zlib: { level: 6 } });
  const done = new Promise<void>((resolve, reject) => {
    out.once('finish', () => resolve());
    out.once('close', () => resolve());
    out.once('error', reject);
    archive.once('error', reject);
    archive.on('warning', reject);
  });
  archive.pipe(out);
  archive.append(result.page, { name: 'index.html' });
  // Two at a time: sharp already uses several threads per image, and the machine has two cores.
  const files = inOrder(
    result.images.map((image) => () => renderBlogImage(image)),
    2,
  );
  try {
    for (const pending of files) {
      // JPEG does not deflate further: store the images as they are.
      for (const v of await pending) archive.append(v.data, { name: `images/${v.name}`, store: true });
    }
  } catch (err) {
    archive.abort();
    throw err;
  }
  await archive.finalize();
  await done;
}
