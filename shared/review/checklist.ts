import type { JSONContent } from '@tiptap/core';
import type { ChecklistDto, ChecklistItemDto } from '../schemas/review';

/** What the review checklist looks at, gathered from the tutorial's sections. */
export type ChecklistInput = {
  /** The saved write-up. */
  doc: JSONContent | null;
  /** Supplies with a shop link marked sponsored. */
  sponsoredLinks: number;
  /** The disclosure that would be shown (the studio's wording or the default); blank when cleared. */
  disclosureText: string;
  /** The cut list's size and its failed checks, with the pieces they concern. */
  pieces: number;
  failedChecks: { pieceName: string; reason: string }[];
  /** Start times of the newest recording's chapters in ms, or null when there is no recording. */
  chapterStarts: number[] | null;
  /** YYYY-MM-DD or null. */
  dueDate: string | null;
  /** When it was last sent for review (YYYY-MM-DD), if it is in review or beyond; else null. */
  sentOn: string | null;
  /** Today, YYYY-MM-DD. */
  today: string;
  openComments: number;
};

/** Joins numbers as a person writes them: "2", "2 and 4", "2, 4 and 5". */
export function listNumbers(ns: number[]): string {
  if (ns.length <= 1) return ns.join('');
  return `${ns.slice(0, -1).join(', ')} and ${ns[ns.length - 1]}`;
}

/** Each step's number and its photos' alt texts. */
function stepPhotos(doc: JSONContent | null): { number: number; alts: string[] }[] {
  const steps: { number: number; alts: string[] }[] = [];
  const stillsIn = (n: JSONContent): string[] => (n.type === 'still' ? [String(n.attrs?.alt ?? '')] : (n.content ?? []).flatMap(stillsIn));
  const walk = (n: JSONContent) => {
    if (n.type === 'step') steps.push({ number: steps.length + 1, alts: stillsIn(n) });
    else for (const c of n.content ?? []) walk(c);
  };
  if (doc) walk(doc);
  return steps;
}

const daysBetween = (a: string, b: string) => Math.round((Date.parse(`${b}T00:00:00Z`) - Date.parse(`${a}T00:00:00Z`)) / 86_400_000);
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/**
 * The review checklist the maker and the coordinator both see: every step has a photo with alt
 * text (WCAG 2.2, 1.1.1 Non-text Content), the disclosure is there when a link is sponsored (US
 * FTC Endorsement Guides, 16 CFR 255.5), the cut list has no failed checks, chapters start at
 * 0:00 (from memory, a common video-platform rule; see REFERENCES.md), and the due date is met.
 * `ok` is null where an item does not apply.
 */
export function reviewChecklist(i: ChecklistInput): ChecklistDto {
  const items: ChecklistItemDto[] = [];

  const steps = stepPhotos(i.doc);
  const noPhoto = steps.filter((s) => s.alts.length === 0).map((s) => s.number);
  const noAlt = steps.filter((s) => s.alts.length > 0 && s.alts.some((a) => !a.trim())).map((s) => s.number);
  const photoDetail = !steps.length
    ? 'The write-up has no steps yet'
    : [
        noPhoto.length ? `${noPhoto.length === 1 ? 'Step' : 'Steps'} ${listNumbers(noPhoto)} ${noPhoto.length === 1 ? 'has' : 'have'} no photo` : '',
        noAlt.length
          ? `${noAlt.length === 1 ? 'Step' : 'Steps'} ${listNumbers(noAlt)} ${noAlt.length === 1 ? 'has a photo' : 'have photos'} without alt text`
          : '',
      ]
        .filter(Boolean)
        .join('; ') || (steps.length === 1 ? 'The step has a photo with alt text' : `All ${steps.length} steps have a photo with alt text`);
  items.push({
    key: 'stepPhotos',
    label: 'Every step has a photo with alt text',
    ok: steps.length > 0 && !noPhoto.length && !noAlt.length,
    detail: photoDetail,
    section: 'write-up',
  });

  items.push(
    i.sponsoredLinks === 0
      ? { key: 'disclosure', label: 'Disclosure present when a link is sponsored', ok: null, detail: 'No sponsored links', section: 'supplies' }
      : {
          key: 'disclosure',
          label: 'Disclosure present when a link is sponsored',
          ok: i.disclosureText.trim().length > 0,
          detail: i.disclosureText.trim()
            ? `${plural(i.sponsoredLinks, 'sponsored link')}; the disclosure is shown`
            : `${plural(i.sponsoredLinks, 'sponsored link')} but the disclosure is blank`,
          section: 'supplies',
        },
  );

  const failed = i.failedChecks;
  items.push(
    i.pieces === 0
      ? { key: 'cutList', label: 'Cut list has no failed checks', ok: null, detail: 'The cut list is empty', section: 'cut-list' }
      : {
          key: 'cutList',
          label: 'Cut list has no failed checks',
          ok: failed.length === 0,
          detail: failed.length
            ? `${plural(failed.length, 'failed check')}: ${failed
                .slice(0, 3)
                .map((c) => `${c.pieceName}: ${c.reason}`)
                .join('; ')}${failed.length > 3 ? '; …' : ''}`
            : i.pieces === 1
              ? 'The piece passes its checks'
              : `All ${i.pieces} pieces pass their checks`,
          section: 'cut-list',
        },
  );

  const starts = i.chapterStarts;
  const first = starts && starts.length ? Math.min(...starts) : null;
  items.push(
    starts === null
      ? { key: 'chapters', label: 'Chapters start at 0:00', ok: null, detail: 'No recording yet', section: 'footage' }
      : {
          key: 'chapters',
          label: 'Chapters start at 0:00',
          ok: first === 0,
          detail:
            first === null
              ? 'No chapters marked yet'
              : first === 0
                ? `${plural(starts.length, 'chapter')}, the first at 0:00`
                : 'The first chapter does not start at 0:00',
          section: 'footage',
        },
  );

  if (!i.dueDate) {
    items.push({ key: 'dueDate', label: 'Due date met', ok: null, detail: 'No due date set', section: 'tutorial' });
  } else {
    const on = i.sentOn ?? i.today;
    const late = daysBetween(i.dueDate, on);
    const detail = i.sentOn
      ? late <= 0
        ? `Sent for review on ${i.sentOn}, due ${i.dueDate}`
        : `Sent for review on ${i.sentOn}, ${plural(late, 'day')} after the due date (${i.dueDate})`
      : late < 0
        ? `Due ${i.dueDate}, in ${plural(-late, 'day')}`
        : late === 0
          ? `Due today (${i.dueDate})`
          : `Was due ${i.dueDate}, ${plural(late, 'day')} ago`;
    items.push({ key: 'dueDate', label: 'Due date met', ok: late <= 0, detail, section: 'tutorial' });
  }

  const applicable = items.filter((x) => x.ok !== null);
  return { items, passed: applicable.filter((x) => x.ok).length, total: applicable.length, openComments: i.openComments };
}
