/**
 * Supplies named in the talk: the materials, adhesives and tools a crafter says they use ("you'll
 * need kraft cardstock, one sheet of patterned paper and a strong liquid glue"), and matching them
 * to supplies the studio listed before. Pure and deterministic, so the assembly proposes the same
 * list every time it runs.
 */
import type { SupplyCategory } from '../schemas/supply';
import { COLOUR_WORDS } from './colour-words';

/** One supply said: its name as said, its category, a quantity when one was said, and where. */
export type SaidSupply = { name: string; category: SupplyCategory; quantity: string; head: string; saidAtMs: number };

type Head = { words: string[]; category: SupplyCategory; caution?: string };

// Names of supplies crafters say on camera, longest first so "glue stick" wins over "glue" (common practice).
const HEADS: Head[] = [
  ['die cutting machine', 'tool'],
  ['die-cutting machine', 'tool'],
  ['hot glue gun', 'adhesive', 'Hot glue and the gun’s nozzle burn: keep fingers clear and the gun on its stand.'],
  ['double-sided tape', 'adhesive'],
  ['double sided tape', 'adhesive'],
  ['glue stick', 'adhesive'],
  ['glue dots', 'adhesive'],
  ['glue gun', 'adhesive', 'Hot glue and the gun’s nozzle burn: keep fingers clear and the gun on its stand.'],
  ['tape runner', 'adhesive'],
  ['foam tape', 'adhesive'],
  ['foam squares', 'adhesive'],
  ['foam dots', 'adhesive'],
  ['foam adhesive', 'adhesive'],
  ['washi tape', 'embellishment'],
  ['bone folder', 'tool'],
  ['scoring board', 'tool'],
  ['score board', 'tool'],
  ['paper trimmer', 'tool'],
  ['craft knife', 'tool', 'Sharp blade: cut on a cutting mat, away from your fingers, and cap it when you put it down.'],
  ['hobby knife', 'tool', 'Sharp blade: cut on a cutting mat, away from your fingers, and cap it when you put it down.'],
  ['cutting mat', 'tool'],
  ['corner rounder', 'tool'],
  ['circle punch', 'tool'],
  ['circle cutter', 'tool', 'Sharp blade: hold the cutter flat and keep fingers out of its path.'],
  ['heat tool', 'tool', 'Heat tools get hot enough to burn and to scorch paper: keep it moving and set it down on a heat-safe surface.'],
  ['embossing folder', 'tool'],
  ['binder clips', 'tool'],
  ['card stock', 'cardstock'],
  ['cardstock', 'cardstock'],
  ['chipboard', 'cardstock'],
  ['vellum', 'paper'],
  ['acetate', 'other'],
  ['paper', 'paper'],
  ['glue', 'adhesive'],
  ['adhesive', 'adhesive'],
  ['tape', 'adhesive'],
  ['scissors', 'tool'],
  ['trimmer', 'tool'],
  ['ruler', 'tool'],
  ['clips', 'tool'],
  ['clothespins', 'tool'],
  ['stylus', 'tool'],
  ['pencil', 'tool'],
  ['compass', 'tool'],
  ['ribbon', 'embellishment'],
  ['twine', 'embellishment'],
  ['sequins', 'embellishment'],
  ['brads', 'embellishment'],
  ['buttons', 'embellishment'],
  ['gems', 'embellishment'],
  ['pearls', 'embellishment'],
  ['stickers', 'embellishment'],
  ['enamel dots', 'embellishment'],
].map(([w, category, caution]) => ({ words: w!.split(' '), category: category as SupplyCategory, ...(caution ? { caution } : {}) }));

/** Words that may stand before a supply's name and belong to it ("strong liquid glue", "kraft cardstock"). */
const MODIFIERS = new Set([
  'kraft',
  'patterned',
  'designer',
  'printed',
  'glitter',
  'foil',
  'metallic',
  'textured',
  'linen',
  'smooth',
  'watercolor',
  'watercolour',
  'heavyweight',
  'lightweight',
  ...COLOUR_WORDS,
  'coordinating',
  'liquid',
  'strong',
  'clear',
  'tacky',
  'wet',
  'permanent',
  'repositionable',
  'fine-tip',
  'precision',
  'quick-drying',
  'fast-drying',
  'pva',
  'craft',
  'sharp',
  'small',
  'large',
  'mini',
  'jute',
  'satin',
  'velvet',
  'baker’s',
  "baker's",
  'bakers',
]);

/** Words that tell two supplies of the same kind apart: "kraft cardstock" is not "white cardstock". */
const DISTINGUISHING = new Set([...MODIFIERS].filter((w) => !['strong', 'clear', 'small', 'large', 'mini', 'sharp', 'precision', 'craft'].includes(w)));

// A word used as a verb or a piece, never a supply on its own: "glue the mat", "tape it down", "pencil in".
const VERB_AFTER = new Set(['it', 'them', 'the', 'this', 'that', 'down', 'on', 'in', 'together', 'up', 'a', 'an', 'your', 'that’s', "that's", 'along']);

const NUMBER_WORDS: Record<string, number> = {
  one: 1,
  a: 1,
  an: 1,
  two: 2,
  three: 3,
  four: 4,
  five: 5,
  six: 6,
  seven: 7,
  eight: 8,
  nine: 9,
  ten: 10,
  twelve: 12,
};
const UNITS = new Set(['sheet', 'sheets', 'pack', 'packs', 'roll', 'rolls', 'piece', 'pieces', 'yard', 'yards', 'strip', 'strips', 'bottle', 'tube']);

type Word = { text: string; lower: string };
const wordsOf = (s: string): Word[] => [...s.matchAll(/[A-Za-z][A-Za-z'’-]*/g)].map((m) => ({ text: m[0], lower: m[0].toLowerCase().replace(/’/g, "'") }));

/** The heads said in a line, with their modifiers and a quantity ("one sheet of patterned paper" -> 1 sheet). */
function suppliesInLine(text: string, atMs: number): (SaidSupply & { caution?: string })[] {
  const w = wordsOf(text);
  const out: (SaidSupply & { caution?: string })[] = [];
  for (let i = 0; i < w.length; i++) {
    const head = HEADS.find((h) => h.words.every((hw, k) => w[i + k]?.lower === hw));
    if (!head) continue;
    const end = i + head.words.length;
    // "glue the mat down": a verb, not a supply (unless a describing word came before it: "the liquid glue")
    const single = head.words.length === 1;
    if (
      single &&
      ['glue', 'tape', 'pencil', 'paper', 'adhesive'].includes(head.words[0]!) &&
      VERB_AFTER.has(w[end]?.lower ?? '') &&
      !MODIFIERS.has(w[i - 1]?.lower ?? '')
    )
      continue;
    // "paper trimmer" inside a longer head is found by that head; a head that is a modifier of the next noun is not the supply ("paper piercing tool")
    let start = i;
    while (start > 0 && end - start < head.words.length + 3 && MODIFIERS.has(w[start - 1]!.lower)) start--;
    let quantity = '';
    const unit = w[start - 2];
    const count = w[start - 3];
    if (w[start - 1]?.lower === 'of' && unit && UNITS.has(unit.lower) && count && NUMBER_WORDS[count.lower] !== undefined)
      quantity = `${NUMBER_WORDS[count.lower]} ${unit.lower}`;
    const name = w
      .slice(start, end)
      .map((x) => x.lower)
      .join(' ');
    out.push({ name, category: head.category, quantity, head: head.words.join(' '), saidAtMs: atMs, ...(head.caution ? { caution: head.caution } : {}) });
    i = end - 1;
  }
  return out;
}

/**
 * Every supply named in a transcript, once each, in the order first said. The same kind said again
 * ("the glue" after "a strong liquid glue") is the same supply; a more specific name said later
 * replaces a bare one ("glue" then "tacky glue"). Cautions come with blades, heat and hot glue.
 */
export function suppliesSaid(cues: readonly { startMs: number; text: string }[]): (SaidSupply & { caution?: string })[] {
  const out: (SaidSupply & { caution?: string })[] = [];
  for (const c of cues) {
    for (const s of suppliesInLine(c.text, c.startMs)) {
      const same = out.find((o) => o.head === s.head && (o.name === s.name || o.name === s.head || s.name === s.head || sameKind(o.name, s.name)));
      if (!same) out.push(s);
      else if (same.name === same.head && s.name !== s.head) Object.assign(same, { name: s.name, quantity: same.quantity || s.quantity });
      else if (!same.quantity && s.quantity) same.quantity = s.quantity;
    }
  }
  return out.map((s) => ({ ...s, name: s.name.charAt(0).toUpperCase() + s.name.slice(1) }));
}

/** Two names of the same head are one supply unless a distinguishing word differs ("kraft cardstock" vs "white cardstock"). */
function sameKind(a: string, b: string): boolean {
  const da = a.split(' ').filter((x) => DISTINGUISHING.has(x));
  const db = b.split(' ').filter((x) => DISTINGUISHING.has(x));
  return da.length === 0 || db.length === 0 || (da.every((x) => db.includes(x)) && db.every((x) => da.includes(x)));
}

/**
 * The studio's earlier supply a said one is, where the names agree: the earlier name holds the
 * said kind ("glue", "cardstock") and every distinguishing word said ("kraft"); the closest such
 * name wins, the first listed (newest) on a tie. Null when none agrees.
 */
export function matchEarlierSupply<T extends { name: string }>(said: SaidSupply, earlier: readonly T[]): T | null {
  const saidWords = said.name.toLowerCase().split(' ');
  const need = saidWords.filter((x) => DISTINGUISHING.has(x));
  let best: { row: T; score: number } | null = null;
  for (const row of earlier) {
    const have = new Set(wordsOf(row.name).map((x) => x.lower));
    if (!said.head.split(' ').every((h) => have.has(h) || have.has(`${h}s`) || have.has(h.replace(/s$/, '')))) continue;
    if (!need.every((x) => have.has(x))) continue;
    const score = saidWords.filter((x) => have.has(x)).length / Math.max(saidWords.length, have.size);
    if (!best || score > best.score) best = { row, score };
  }
  return best?.row ?? null;
}
