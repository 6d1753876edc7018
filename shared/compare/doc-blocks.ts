import type { JSONContent } from '@tiptap/core';
import { plainText } from '../editor/render-parts';
import type { TextBlock } from './compare';

const str = (v: unknown) => (typeof v === 'string' ? v.trim() : '');

/** A photo's words: its caption and alt text, which are what a reader (or a screen reader) gets of it. */
function stillText(n: JSONContent): string {
  const caption = str(n.attrs?.caption);
  const alt = str(n.attrs?.alt);
  const parts = [caption ? `Photo: ${caption}` : 'Photo', alt && alt !== caption ? `(alt text: ${alt})` : ''];
  return parts.filter(Boolean).join(' ');
}

/**
 * The write-up as blocks of text in reading order, each with where it sits: the unit the
 * comparison lines up side by side. Paragraphs, headings, list items, quotes, photos (caption
 * and alt text), tips and cautions each make one; a step's title is its own block, so a renamed
 * step shows as one change. The live cut list and supplies are marked where they sit (their rows
 * are compared in their own sections).
 */
export function docBlocks(doc: JSONContent | null | undefined): TextBlock[] {
  const out: TextBlock[] = [];
  let step = 0;
  let place = 'Introduction';
  const push = (label: string, text: string) => {
    if (text.trim()) out.push({ label, text: text.trim() });
  };
  const visit = (nodes: readonly JSONContent[] | undefined, label: string) => {
    for (const n of nodes ?? []) {
      switch (n.type) {
        case 'heading':
          push('Heading', plainText(n));
          if (label === place) place = plainText(n).trim() || place;
          break;
        case 'step': {
          step++;
          const stepLabel = `Step ${step}`;
          const [first, ...rest] = n.content ?? [];
          if (first?.type === 'stepTitle') {
            push(`${stepLabel} · title`, plainText(first));
            visit(rest, stepLabel);
          } else visit(n.content, stepLabel);
          break;
        }
        case 'still':
          push(`${label} · photo`, stillText(n));
          break;
        case 'tip':
        case 'caution':
          for (const child of n.content ?? []) push(`${label} · ${n.type}`, child.type === 'still' ? stillText(child) : plainText(child));
          break;
        case 'bulletList':
        case 'orderedList':
          for (const item of n.content ?? []) visit(item.content, label);
          break;
        case 'blockquote':
          for (const child of n.content ?? []) push(`${label} · quote`, plainText(child));
          break;
        case 'cutList':
          push(label, '[The cut list]');
          break;
        case 'supplyList':
          push(label, '[The supplies]');
          break;
        case 'horizontalRule':
          break;
        default:
          push(label, plainText(n));
      }
    }
  };
  for (const n of doc?.content ?? []) {
    if (n.type === 'heading' && n.attrs?.level === 1) {
      push('Title heading', plainText(n));
      continue;
    }
    visit([n], n.type === 'step' ? '' : place);
  }
  return out;
}
