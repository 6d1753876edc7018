/**
 * An invented tutorial for the publish tests and the export bench: a round hatbox with a
 * 6 in base, two wall strips with glue tabs, a lid, a topper and a gift tag. Stills are solid
 * colour JPEGs made with sharp in a directory the caller gives.
 */
import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import type { JSONContent } from '@tiptap/core';
import sharp from 'sharp';
import { inches, millimetres, type Piece } from '@shared/measure';
import type { PublishBundle, PublishStill } from './types';

/** Writes a solid-colour JPEG of the given size. */
export async function makeSolidJpeg(file: string, width: number, height: number, rgb: [number, number, number]): Promise<void> {
  await sharp({ create: { width, height, channels: 3, background: { r: rgb[0], g: rgb[1], b: rgb[2] } } })
    .jpeg({ quality: 90 })
    .toFile(file);
}

const text = (t: string, marks?: JSONContent['marks']): JSONContent => (marks ? { type: 'text', text: t, marks } : { type: 'text', text: t });
const para = (...content: JSONContent[]): JSONContent => ({ type: 'paragraph', content });
const heading = (level: number, t: string): JSONContent => ({ type: 'heading', attrs: { level }, content: [text(t)] });
const still = (stillId: string | null, src: string, alt: string, caption: string): JSONContent => ({
  type: 'still',
  attrs: { stillId, src, alt, caption, width: null, height: null },
});
const step = (atMs: number | null, title: string, ...body: JSONContent[]): JSONContent => ({
  type: 'step',
  attrs: { atMs, chapterId: null },
  content: [{ type: 'stepTitle', content: [text(title)] }, ...body],
});

/** The hatbox cut list: exact lengths, one piece given in millimetres. */
export function hatboxPieces(): Piece[] {
  return [
    { id: 'base', name: 'Base circle', material: 'kraft cardstock', quantity: 1, shape: 'circle', width: inches(6), height: inches(6), scoreLines: [] },
    {
      id: 'wall',
      name: 'Wall strip',
      material: 'kraft cardstock',
      quantity: 2,
      shape: 'rect',
      width: inches([169, 16]),
      height: inches([5, 2]),
      scoreLines: [{ axis: 'height', at: inches(2), tab: true }],
      notes: 'tab along the bottom edge',
    },
    {
      id: 'lid',
      name: 'Lid circle',
      material: 'kraft cardstock',
      quantity: 1,
      shape: 'circle',
      width: inches([49, 8]),
      height: inches([49, 8]),
      scoreLines: [],
    },
    {
      id: 'topper',
      name: 'Lid topper',
      material: 'floral patterned paper',
      quantity: 1,
      shape: 'circle',
      width: inches([47, 8]),
      height: inches([47, 8]),
      scoreLines: [],
      matOn: 'lid',
    },
    {
      id: 'tag',
      name: 'Gift tag',
      material: 'kraft cardstock',
      quantity: 1,
      shape: 'rect',
      width: inches(2),
      height: inches([7, 2]),
      scoreLines: [{ axis: 'height', at: inches([1, 2]) }],
      notes: 'punch a hole for the ribbon',
    },
    {
      id: 'tagmat',
      name: 'Tag mat',
      material: 'floral patterned paper',
      quantity: 1,
      shape: 'rect',
      width: millimetres(45),
      height: millimetres(80),
      scoreLines: [],
      matOn: 'tag',
    },
  ];
}

/** The hatbox write-up: title, intro, supplies, cut list, four steps, a tip and a caution. */
export function hatboxDoc(): JSONContent {
  return {
    type: 'doc',
    content: [
      heading(1, 'Round hatbox'),
      para(text('A sturdy round hatbox from two sheets of kraft cardstock, with a patterned lid topper and a matching tag.')),
      heading(2, 'Supplies'),
      { type: 'supplyList', attrs: { grouped: true } },
      heading(2, 'Cut list'),
      { type: 'cutList', attrs: { units: 'both' } },
      heading(2, 'Steps'),
      step(
        15_000,
        'Cut the pieces',
        para(text('Cut both circles and the '), text('wall strips', [{ type: 'bold' }]), text(' with a craft knife on a cutting mat.')),
        still('s1', '/media/stills/s1.jpg', 'Two kraft circles and two strips on a cutting mat', 'Everything cut'),
        { type: 'caution', content: [para(text('Change the blade before it drags: a dull blade slips.'))] },
      ),
      step(
        95_000,
        'Score the wall strips',
        para(text('Score each strip 2 in from the top edge, then cut notches in the tab every half inch.')),
        {
          type: 'bulletList',
          content: [
            { type: 'listItem', content: [para(text('Fold the tab inwards.'))] },
            { type: 'listItem', content: [para(text('Burnish the fold with a bone folder.'))] },
          ],
        },
        still('s2', '/media/stills/s2.jpg', '', 'Scoring the strip'),
      ),
      step(
        180_000,
        'Glue the wall to the base',
        para(
          text('Run liquid glue along the tabs and wrap the first strip around the base circle; see the '),
          text('glue guide', [{ type: 'link', attrs: { href: 'https://papershop.example/glue-guide' } }]),
          text(' for drying times.'),
        ),
        still('s3', '/media/stills/s3.jpg', '', ''),
        { type: 'tip', content: [para(text('Clip the overlap with a binder clip while the glue sets.'))] },
      ),
      step(300_000, 'Cover the lid', para(text('Glue the topper to the lid circle, leaving an even border all round.'))),
      { type: 'tip', content: [para(text('Line the box with tissue paper before you fill it.'))] },
    ],
  };
}

/** The hatbox bundle with its three stills written into `dir` (made if missing). */
export async function hatboxBundle(dir: string): Promise<PublishBundle> {
  await mkdir(dir, { recursive: true });
  // One larger than the blog's 1200 px, one between 600 and 1200, one smaller than 600.
  const specs: [string, number, number, [number, number, number], string, string][] = [
    ['s1', 1600, 900, [200, 60, 60], 'Two kraft circles and two strips on a cutting mat', 'Everything cut'],
    ['s2', 800, 450, [60, 160, 90], '', 'Scoring the strip'],
    ['s3', 400, 300, [60, 90, 200], '', ''],
  ];
  const stills: PublishStill[] = [];
  for (const [id, w, h, rgb, alt, caption] of specs) {
    const file = join(dir, `${id}.jpg`);
    await makeSolidJpeg(file, w, h, rgb);
    stills.push({ id, atMs: 0, caption, alt, width: w, height: h, file });
  }
  stills[0]!.atMs = 20_000;
  stills[1]!.atMs = 100_000;
  stills[2]!.atMs = 190_000;
  return {
    tutorial: {
      title: 'Round hatbox',
      slug: 'round-hatbox',
      studioName: 'Paper Lantern Studio',
      authorName: 'Robin Ash',
      publicUrl: 'https://cardwright.example/t/round-hatbox',
      videoUrl: 'https://video.example/watch/hatbox',
      totalTimeMinutes: 90,
    },
    doc: hatboxDoc(),
    pieces: hatboxPieces(),
    supplies: [
      {
        category: 'cardstock',
        name: 'Kraft cardstock, 80 lb',
        quantity: '3 sheets',
        note: '',
        url: 'https://papershop.example/kraft-80',
        sponsored: true,
        discountCode: 'HATBOX10',
      },
      {
        category: 'paper',
        name: 'Floral patterned paper',
        quantity: '1 sheet',
        note: '12 x 12 in',
        url: 'https://papershop.example/floral',
        sponsored: false,
        discountCode: null,
      },
      { category: 'adhesive', name: 'Liquid glue with a fine tip', quantity: '', note: '', url: null, sponsored: false, discountCode: null },
      { category: 'embellishment', name: 'Satin ribbon', quantity: '24 in', note: '', url: null, sponsored: false, discountCode: null },
      { category: 'tool', name: 'Craft knife', quantity: '', note: '', url: null, sponsored: false, discountCode: null },
      { category: 'tool', name: 'Scoring board', quantity: '', note: '', url: 'https://papershop.example/scoring-board', sponsored: false, discountCode: null },
    ],
    disclosure: 'Papershop sent me the kraft cardstock for this project; the link to it is sponsored.',
    chapters: [
      { title: 'Cutting the pieces', startMs: 15_000 },
      { title: 'Scoring the wall', startMs: 95_000 },
      { title: 'Gluing the wall', startMs: 180_000 },
      { title: 'The lid', startMs: 300_000 },
    ],
    stills,
    precision: 16,
  };
}
