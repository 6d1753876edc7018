import type { JSONContent } from '@tiptap/core';

// Test documents of our own: a round gift box write-up with three steps.
const text = (t: string): JSONContent[] => (t ? [{ type: 'text', text: t }] : []);

/** A step with a title and one paragraph. */
export function step(title: string, body: string, atMs: number | null = null): JSONContent {
  return {
    type: 'step',
    attrs: { atMs, chapterId: null },
    content: [
      { type: 'stepTitle', content: text(title) },
      { type: 'paragraph', content: text(body) },
    ],
  };
}

/** Title, intro, three steps with a tip paragraph between the first two. */
export function giftBoxDoc(): JSONContent {
  return {
    type: 'doc',
    content: [
      { type: 'heading', attrs: { level: 1 }, content: text('Round gift box') },
      { type: 'paragraph', content: text('A small box with a wrapped wall.') },
      step('Cut the circles', 'Cut two 3 in circles.', 12_000),
      { type: 'paragraph', content: text('Keep the offcuts for the lid band.') },
      step('Score the wall', 'Score the strip every half inch.', 95_000),
      step('Glue the tabs', 'Glue the tabs to the base.', 192_000),
    ],
  };
}
