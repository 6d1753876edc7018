import type { Config } from 'tailwindcss';
import plugin from 'tailwindcss/plugin';
import { palette as c, paletteCssVariables } from './shared/palette';

/** The palette (shared/palette.ts) and type of DESIGN.md, "Look and feel". */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: c.paper,
        ink: c.ink,
        kraft: { DEFAULT: c.kraft, dark: c.kraftDark, light: c.kraftLight },
        sage: { DEFAULT: c.sage, light: c.sageLight },
        rosehip: { DEFAULT: c.rosehip, light: c.rosehipLight },
        pencil: c.pencil,
        line: c.line,
        field: c.field,
      },
      fontFamily: {
        serif: ['Merriweather', 'Georgia', 'serif'],
        sans: ['Inter', 'system-ui', 'sans-serif'],
      },
    },
  },
  // Every colour as a CSS variable too (--palette-kraft ...), for the plain CSS files.
  plugins: [plugin(({ addBase }) => addBase({ ':root': paletteCssVariables() }))],
} satisfies Config;
