import { describe, expect, it } from 'vitest';
import { contrastRatio, palette, paletteCssVariables } from './palette';

const WHITE = '#FFFFFF';

describe('contrast ratio (WCAG 2.2 definitions of relative luminance and contrast ratio)', () => {
  it('gives 21:1 for black on white and 1:1 for a colour on itself (the ends of the WCAG scale)', () => {
    expect(contrastRatio('#000000', WHITE)).toBeCloseTo(21, 5);
    expect(contrastRatio(palette.kraft, palette.kraft)).toBe(1);
  });

  it('matches worked values: #767676 on white is 4.54:1, #777777 is 4.48:1 (from memory: the usual "lightest grey that passes" example)', () => {
    expect(contrastRatio('#767676', WHITE)).toBeCloseTo(4.54, 2);
    expect(contrastRatio('#777777', WHITE)).toBeCloseTo(4.48, 2);
  });

  it('shows the old tones failed: pencil #8A8F98 on white about 3.3:1, white on kraft #A87B4F about 3.7:1 (the issue’s figures)', () => {
    expect(contrastRatio('#8A8F98', WHITE)).toBeCloseTo(3.25, 1);
    expect(contrastRatio(WHITE, '#A87B4F')).toBeCloseTo(3.74, 1);
  });
});

// Every text/surface pair the interface uses; 4.5:1 for normal text (WCAG 2.2 SC 1.4.3, AA) and
// 3:1 for the outline of a control (SC 1.4.11).
const TEXT_PAIRS: [string, keyof typeof palette, keyof typeof palette | 'white'][] = [
  ['body text', 'ink', 'paper'],
  ['secondary text on white', 'pencil', 'white'],
  ['secondary text on paper', 'pencil', 'paper'],
  ['secondary text on kraft-light (selected rows)', 'pencil', 'kraftLight'],
  ['button label on kraft', 'paper', 'kraft'],
  ['links and active tabs on paper', 'kraftDark', 'paper'],
  ['active navigation on kraft-light', 'kraftDark', 'kraftLight'],
  ['kraft text on white', 'kraft', 'white'],
  ['error text on white', 'rosehip', 'white'],
  ['error notices on rosehip-light', 'rosehip', 'rosehipLight'],
  ['success text on white', 'sage', 'white'],
  ['success text on sage-light', 'sage', 'sageLight'],
  ['published badge: white on sage', 'paper', 'sage'],
  ['quotes and captions in the write-up', 'inkSoft', 'white'],
  ['the tip label on sage-light', 'sageDark', 'sageLight'],
];

describe('the palette meets WCAG 2.2 AA', () => {
  it.each(TEXT_PAIRS)('%s: at least 4.5:1', (_what, fg, bg) => {
    expect(contrastRatio(palette[fg], bg === 'white' ? WHITE : palette[bg])).toBeGreaterThanOrEqual(4.5);
  });

  it('a text field’s outline stands out from white and paper at 3:1 (SC 1.4.11), and so does the focus ring (kraft)', () => {
    for (const bg of [WHITE, palette.paper]) {
      expect(contrastRatio(palette.field, bg)).toBeGreaterThanOrEqual(3);
      expect(contrastRatio(palette.kraft, bg)).toBeGreaterThanOrEqual(3);
    }
  });
});

describe('the palette as CSS variables (for the plain CSS files)', () => {
  it('gives one kebab-case variable per colour with the same value', () => {
    const vars = paletteCssVariables();
    expect(Object.keys(vars)).toHaveLength(Object.keys(palette).length);
    expect(vars['--palette-kraft-dark']).toBe(palette.kraftDark);
    expect(vars['--palette-rosehip-light']).toBe(palette.rosehipLight);
  });

  it('leaves no colour written out in the stylesheets: they read the variables', async () => {
    const { readFileSync } = await import('node:fs');
    for (const file of ['src/index.css', 'src/features/write-up/components/write-up.css']) {
      expect(readFileSync(file, 'utf8')).not.toMatch(/#[0-9a-f]{3,6}\b/i);
    }
  });
});
