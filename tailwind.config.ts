import type { Config } from 'tailwindcss';

/** The palette and type of DESIGN.md, "Look and feel". */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: '#FBF8F3',
        ink: '#22303C',
        kraft: { DEFAULT: '#A87B4F', dark: '#8C6440', light: '#EFE4D6' },
        sage: { DEFAULT: '#6E8B74', light: '#E3EBE4' },
        rosehip: { DEFAULT: '#B5475B', light: '#F5E1E5' },
        pencil: '#8A8F98',
        line: '#E6DFD3',
      },
      fontFamily: {
        serif: ['Merriweather', 'Georgia', 'serif'],
        sans: ['Inter', 'system-ui', 'sans-serif'],
      },
    },
  },
} satisfies Config;
