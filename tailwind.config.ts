import type { Config } from 'tailwindcss';

// Quillane's own palette, named after a salt-marsh lane: paper and fold for the sheet, ink for
// text, tide for actions, reed for highlights, heron for information, ember for danger.
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f7f5ef', deep: '#efeadf', card: '#fffdf8' },
        fold: { DEFAULT: '#ddd6c6', strong: '#c5bca8' },
        ink: { DEFAULT: '#1e2a28', soft: '#4d5b58', faint: '#7a8683' },
        tide: {
          50: '#eef5f2',
          100: '#d6e8e1',
          200: '#acd0c3',
          300: '#7fb3a2',
          400: '#4f8f7d',
          500: '#337565',
          600: '#275e52',
          700: '#21443d',
          800: '#1a3631',
          900: '#122622',
        },
        reed: { 100: '#f8edd0', 300: '#e9c46a', 500: '#c9952c', 700: '#7d5a12' },
        heron: { 50: '#eef3f7', 100: '#d9e4ee', 500: '#4a6f8f', 700: '#33506a' },
        ember: { 50: '#fbefeb', 100: '#f5d9d0', 500: '#b4482f', 700: '#85321f' },
      },
      fontFamily: {
        sans: ['"Noto Sans"', 'system-ui', 'sans-serif'],
        mono: ['"Noto Sans Mono"', 'ui-monospace', 'monospace'],
      },
      boxShadow: {
        sheet: '0 1px 0 rgba(30, 42, 40, 0.04), 0 6px 18px -10px rgba(30, 42, 40, 0.25)',
      },
    },
  },
} satisfies Config;
