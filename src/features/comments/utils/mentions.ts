/** Typing "@" and some letters asks for a person: the query is what follows the "@" up to the caret. */
export function mentionQuery(text: string, caret: number): { start: number; query: string } | null {
  const before = text.slice(0, caret);
  const at = before.lastIndexOf('@');
  if (at < 0) return null;
  // An "@" inside a word (an e-mail address) is not a mention.
  if (at > 0 && /[\p{L}\p{N}._-]/u.test(before[at - 1]!)) return null;
  const query = before.slice(at + 1);
  // Names have spaces ("Ann Lee"), but a query stops at a line break or after three words.
  if (/\n/.test(query) || query.length > 40 || query.split(' ').length > 3) return null;
  return { start: at, query };
}

/** People whose name matches the query: names starting with it first, then names with a word starting with it. */
export function matchPeople<P extends { name: string }>(people: P[], query: string, limit = 6): P[] {
  const q = query.trim().toLowerCase();
  if (!q) return people.slice(0, limit);
  const starts = people.filter((p) => p.name.toLowerCase().startsWith(q));
  const words = people.filter(
    (p) =>
      !starts.includes(p) &&
      p.name
        .toLowerCase()
        .split(/\s+/)
        .some((w) => w.startsWith(q)),
  );
  return [...starts, ...words].slice(0, limit);
}

/** The text with the query replaced by "@Name " and where the caret goes next. */
export function insertMention(text: string, start: number, caret: number, name: string): { text: string; caret: number } {
  const inserted = `@${name} `;
  return { text: text.slice(0, start) + inserted + text.slice(caret), caret: start + inserted.length };
}

/** The picked people whose "@Name" is still in the text (a name deleted again is no longer mentioned). */
export function mentionsStillIn<P extends { id: string; name: string }>(text: string, picked: P[]): string[] {
  return picked.filter((p) => text.toLowerCase().includes(`@${p.name.toLowerCase()}`)).map((p) => p.id);
}

/** Splits a comment into text and mentions of the people it names, for showing the mentions apart. */
export function splitMentions(body: string, names: string[]): { text: string; mention: boolean }[] {
  const sorted = [...new Set(names)].filter(Boolean).sort((a, b) => b.length - a.length);
  if (!sorted.length) return [{ text: body, mention: false }];
  const re = new RegExp(`(@(?:${sorted.map((n) => n.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')).join('|')}))(?![\\p{L}\\p{N}])`, 'giu');
  const out: { text: string; mention: boolean }[] = [];
  let last = 0;
  for (const m of body.matchAll(re)) {
    if (m.index > last) out.push({ text: body.slice(last, m.index), mention: false });
    out.push({ text: m[0], mention: true });
    last = m.index + m[0].length;
  }
  if (last < body.length) out.push({ text: body.slice(last), mention: false });
  return out;
}
