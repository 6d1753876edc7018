/**
 * Cardwright's palette (DESIGN.md, "Look and feel"), in one place for everything that draws:
 * Tailwind's theme, the PDFs, the print view, the public page, the blog export, e-mail and the
 * sheet-plan drawing. Change a colour here and every surface follows.
 *
 * The tones meet WCAG 2.2 AA: paper, ink, kraft, sage, rosehip and pencil keep their hues; the
 * mid tones are darker so that text reaches 4.5:1 and control outlines 3:1 on the surfaces they
 * sit on (palette.test.ts checks every pair the interface uses).
 */
export const palette = {
  /** Background: warm paper. */
  paper: '#FBF8F3',
  /** Text. */
  ink: '#22303C',
  /** Primary: buttons (white text on it), the dashed score-line rule. Was #A87B4F (3.7:1 under white text). */
  kraft: '#8F653E',
  /** Kraft text and links on paper, white and kraft-light. */
  kraftDark: '#6E4D2F',
  kraftLight: '#EFE4D6',
  /** Links on white pages, dark enough for small text (WCAG AA). */
  kraftDeep: '#6E4D2F',
  /** Success, tips. Was #6E8B74 (3.7:1 on white). */
  sage: '#527058',
  sageLight: '#E3EBE4',
  /** Warnings, cautions, danger. Was #B5475B (4.2:1 on rosehip-light). */
  rosehip: '#A53F55',
  rosehipLight: '#F5E1E5',
  /** Secondary text, millimetres beside inches. Was #8A8F98 (3.3:1 on white). */
  pencil: '#5F6670',
  /** Hairlines on screen: decoration, not a control's outline. */
  line: '#E6DFD3',
  /** The outline of a text field or a select, which must stand out (WCAG 1.4.11: 3:1). */
  field: '#857D70',
  /** Hairlines and table rules on paper, a shade darker so they print. */
  rule: '#D9D2C7',
  /** Table heads on paper. */
  shade: '#F1ECE4',
  /** Glue tabs on the cutting template. */
  tab: '#EFE6DA',
  white: '#FFFFFF',
  /** Quieter text inside the write-up's prose: quotes, captions, table heads. */
  inkSoft: '#4B5561',
  /** The tip label on sage-light, a shade darker than sage. */
  sageDark: '#4C6652',
  /** A step's card in the write-up, a shade lighter than paper. */
  card: '#FDFBF8',
  /** Disabled controls' text (WCAG exempts inactive controls from contrast). */
  disabled: '#C7C9CD',
  /** The passage a comment points at, marked in the text. */
  highlight: '#F3E3B5',
} as const;

/**
 * The palette as CSS custom properties (`--palette-kraft-dark: #6E4D2F`), which Tailwind's
 * config puts on :root so plain CSS (ProseMirror's DOM, stacked tables) reads the same colours.
 */
export function paletteCssVariables(): Record<string, string> {
  return Object.fromEntries(Object.entries(palette).map(([name, hex]) => [`--palette-${name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}`, hex]));
}

/** Relative luminance of an sRGB colour (WCAG 2.2, "relative luminance"). */
export function relativeLuminance(hex: string): number {
  const h = hex.replace('#', '');
  const [r, g, b] = [0, 2, 4].map((i) => {
    const c = parseInt(h.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

/** Contrast ratio of two colours, from 1 to 21 (WCAG 2.2, "contrast ratio"). */
export function contrastRatio(a: string, b: string): number {
  const [hi, lo] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}
