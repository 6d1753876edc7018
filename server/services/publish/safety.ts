/**
 * The usual safety notes for the tools a tutorial uses, found in its supplies and its words.
 * The wording is common practice for craft classes, not quoted from any standard.
 */
import { blocksText } from './doc-parts';
import type { PublishBundle } from './types';

export type Hazard = 'blade' | 'heat' | 'adhesive';

const PATTERNS: Record<Hazard, RegExp> = {
  blade: /\b(?:craft knife|knife|knives|blades?|trimmers?|guillotine|scissors|scalpel|cutters?)\b/i,
  // Dry embossing (a folder through a machine) uses no heat, so "embossing folder" is left out.
  heat: /\b(?:heat gun|heat tool|heat[- ]?emboss\w*|embossing(?!\s+folders?\b)|embossing powder|hot glue|glue gun)\b/i,
  adhesive: /\b(?:glue|glues|glued|gluing|adhesives?|spray(?:ed|ing)?|glue stick|contact cement|epoxy)\b/i,
};

/**
 * Which hazards the tutorial involves: from supply categories and names, and the write-up's text.
 * A cut list means pieces to cut, so blades too, whatever the words say.
 */
export function detectHazards(bundle: Pick<PublishBundle, 'supplies' | 'doc'> & { pieces?: PublishBundle['pieces'] }): Set<Hazard> {
  const found = new Set<Hazard>();
  if (bundle.pieces?.length) found.add('blade');
  const texts = [...bundle.supplies.map((s) => `${s.name} ${s.note}`), blocksText(bundle.doc?.content)];
  if (bundle.supplies.some((s) => s.category.trim().toLowerCase() === 'adhesive')) found.add('adhesive');
  for (const hazard of Object.keys(PATTERNS) as Hazard[]) if (texts.some((t) => PATTERNS[hazard].test(t))) found.add(hazard);
  return found;
}

const NOTES: Record<Hazard, string> = {
  blade:
    'Blades: cut away from your fingers, on a cutting mat, with the hand that holds the paper out of the blade’s path; change a dull blade (it slips); retract or cap the knife whenever you put it down, and keep blades out of children’s reach.',
  heat: 'Heat tools: the nozzle and the heated surface stay hot after use; rest the tool on a heat-proof surface away from paper and cords, and keep fingers out of the airflow.',
  adhesive: 'Adhesives: read the label; use spray adhesive and solvent glues only with fresh air, protect the table, and keep glue away from eyes and mouths.',
};

/**
 * The safety lines for a handout: one per hazard found, adult supervision for children when
 * there are blades or heat tools, and always a closing line deferring to the maker's judgement.
 */
export function safetyNotes(hazards: ReadonlySet<Hazard>): string[] {
  const lines = (['blade', 'heat', 'adhesive'] as const).filter((h) => hazards.has(h)).map((h) => NOTES[h]);
  if (hazards.has('blade') || hazards.has('heat')) lines.push('In a class with children, an adult supervises every use of blades and heat tools.');
  lines.push('These notes are general: use your own judgement, follow each product’s instructions, and keep to the rules of your venue or school.');
  return lines;
}
