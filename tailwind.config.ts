import type { Config } from 'tailwindcss';

// Hourstone's own palette: the colours of a working yard, not a brand kit.
// field = green-grey ink (text, primary actions), oat = warm paper, loam = brown accent,
// straw = amber (due soon), poppy = red (overdue, destructive), sky = info, clover = ok.
// Status colours are never the only signal: every status also carries a text label and an icon.
const palette = {
  field: {
    50: '#f3f5f2',
    100: '#e3e8e2',
    200: '#c7d1c6',
    300: '#a3b2a3',
    400: '#7d8f7e',
    500: '#5f7261',
    600: '#4a5b4d',
    700: '#3b4a3f',
    800: '#2b3a31',
    900: '#1f2a23',
    950: '#131a16',
  },
  oat: {
    50: '#fcfaf6',
    100: '#f6f1e7',
    200: '#ece3d2',
    300: '#ddd0b8',
    400: '#c7b595',
  },
  loam: {
    50: '#f8f2ec',
    100: '#eedfd0',
    200: '#dcbfa2',
    300: '#c69d76',
    400: '#ad7c52',
    500: '#92633d',
    600: '#784f31',
    700: '#5f3e28',
    800: '#4a3121',
    900: '#36241a',
  },
  straw: {
    50: '#fdf8e8',
    100: '#faedc4',
    200: '#f4da8a',
    300: '#eec55c',
    400: '#e9b949',
    500: '#d49a1f',
    600: '#b17a12',
    700: '#8a5c10',
    800: '#6b4712',
    900: '#4f3410',
  },
  poppy: {
    50: '#fdf1ef',
    100: '#fadcd6',
    200: '#f3b1a5',
    300: '#ea8371',
    400: '#dd5540',
    500: '#c83a26',
    600: '#a92c1c',
    700: '#8a2318',
    800: '#6e1d16',
    900: '#521612',
  },
  sky: {
    50: '#eff6fb',
    100: '#d9eaf5',
    200: '#b0d3ea',
    300: '#7fb5d9',
    400: '#4d93c4',
    500: '#2f77ab',
    600: '#235f8e',
    700: '#1d4c72',
    800: '#183c5a',
    900: '#122c43',
  },
  clover: {
    50: '#eef7ef',
    100: '#d5ecd8',
    200: '#a9d6b0',
    300: '#76bb83',
    400: '#4a9d5b',
    500: '#2f8143',
    600: '#236836',
    700: '#1c522c',
    800: '#163f23',
    900: '#10301b',
  },
};

export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    // A slightly larger scale than usual: screens are read at arm's length in daylight.
    fontSize: {
      xs: ['0.8125rem', { lineHeight: '1.125rem' }],
      sm: ['0.9375rem', { lineHeight: '1.375rem' }],
      base: ['1.0625rem', { lineHeight: '1.625rem' }],
      lg: ['1.25rem', { lineHeight: '1.75rem' }],
      xl: ['1.5rem', { lineHeight: '2rem' }],
      '2xl': ['1.875rem', { lineHeight: '2.375rem', letterSpacing: '-0.01em' }],
      '3xl': ['2.375rem', { lineHeight: '2.75rem', letterSpacing: '-0.015em' }],
    },
    extend: {
      colors: palette,
      fontFamily: {
        sans: ['Lato', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
      spacing: {
        // WCAG 2.5.5 target size: gloved thumbs in the yard need at least 44 px.
        touch: '2.75rem',
      },
      boxShadow: {
        card: '0 1px 2px rgb(31 42 35 / 0.06), 0 2px 8px rgb(31 42 35 / 0.06)',
      },
    },
  },
} satisfies Config;
