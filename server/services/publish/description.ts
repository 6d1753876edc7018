/**
 * The video description (P4): plain text for the video page, with the chapter list, the
 * supplies and their links, the disclosure and the link to the written tutorial.
 */
import { groupSupplies, sponsoredTag, supplyDetails } from '@shared/editor/render-parts';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { introText } from './doc-parts';
import { toRenderSupplies } from './render-inputs';
import type { PublishBundle } from './types';
import { endSentence } from '@shared/sentence';

/**
 * Chapter lines "m:ss Title", sorted by time. The first line is always at 0:00 (video platforms
 * read a chapter list only when it starts there: from memory, a common platform rule), so a
 * list that starts later gets "0:00 Introduction" first.
 */
export function chapterLines(chapters: PublishBundle['chapters']): string[] {
  const sorted = [...chapters].filter((c) => Number.isFinite(c.startMs) && c.startMs >= 0).sort((a, b) => a.startMs - b.startMs);
  if (!sorted.length) return [];
  const lines = sorted.map((c) => `${formatTimestamp(c.startMs)} ${c.title.replace(/\s+/g, ' ').trim() || 'Chapter'}`);
  // Times show to the whole second, so anything under a second is already "0:00".
  if (sorted[0]!.startMs >= 1000) lines.unshift('0:00 Introduction');
  return lines;
}

/** The plain-text description for the video page. */
export function videoDescription(bundle: PublishBundle): string {
  const { tutorial } = bundle;
  const blocks: string[] = [];
  blocks.push(introText(bundle.doc) || endSentence(`${tutorial.title}: a step-by-step paper craft tutorial by ${tutorial.authorName}`));
  if (tutorial.publicUrl) blocks.push(`The written tutorial, with the cut list and a printable template: ${tutorial.publicUrl}`);

  const chapters = chapterLines(bundle.chapters);
  if (chapters.length) blocks.push(['Chapters', ...chapters].join('\n'));

  const supplies = toRenderSupplies(bundle.supplies);
  if (supplies.length) {
    const lines: string[] = ['Supplies'];
    // Above the links, where a viewer reads it before clicking (FTC Endorsement Guides, 16 CFR 255: clear and conspicuous).
    if (bundle.disclosure?.trim()) lines.push(bundle.disclosure.trim());
    for (const group of groupSupplies(supplies)) {
      lines.push('', `${group.label}:`);
      for (const s of group.items) {
        const d = supplyDetails(s);
        const link = s.url ? `: ${s.url}` : '';
        const code = d.code ? ` (discount code ${d.code})` : '';
        lines.push(`- ${s.name}${sponsoredTag(s)}${d.quantity}${d.note}${link}${code}`);
      }
    }
    blocks.push(lines.join('\n'));
  }
  return `${blocks.join('\n\n')}\n`;
}
