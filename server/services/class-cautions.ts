/**
 * The usual cautions for a room of people cutting and gluing. The wording is common practice for
 * craft classes, not quoted from any standard; the teacher can replace it per class, and it always
 * ends by deferring to the venue's rules and the teacher's judgement.
 */
import type { Hazard } from './publish/safety';

export const CLASS_CAUTION_LINES = {
  blade:
    'Craft knives and paper trimmers: cut on a mat, away from your body and from the hand that holds the paper; cap or retract the blade whenever you put it down, and blades are counted back in at the end of the class.',
  heat: 'Hot glue and heat tools: the nozzle, the glue and the heated surface stay hot after use; rest them on their stand on a heat-proof surface, away from paper, cords and elbows.',
  adhesive:
    'Adhesives: spray adhesive and solvent glues only by an open window or outdoors with fresh air moving; protect the table and keep glue away from eyes and mouths.',
  children:
    'Children: the class is for ages 12 and up; younger makers are welcome with an adult alongside them for the whole class, and an adult hands out and collects the blades.',
  defer: 'These notes are general: the venue’s rules and the teacher’s judgement on the day come first, and so does each product’s own label.',
} as const;

/** The default cautions for a class, one a line: blades always, heat and adhesives when the tutorial names them. */
export function defaultClassCautions(hazards: ReadonlySet<Hazard>): string[] {
  const lines: string[] = [CLASS_CAUTION_LINES.blade];
  if (hazards.has('heat')) lines.push(CLASS_CAUTION_LINES.heat);
  if (hazards.has('adhesive')) lines.push(CLASS_CAUTION_LINES.adhesive);
  lines.push(CLASS_CAUTION_LINES.children, CLASS_CAUTION_LINES.defer);
  return lines;
}

/** The teacher's own wording, one caution a line (blank lines dropped). */
export const cautionLines = (text: string): string[] =>
  text
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter(Boolean);
