import type { Config } from 'tailwindcss';

/**
 * Runnel's own look: deep creek-water blues for structure, moss greens for "works", ochre and
 * clay for cautions and dangers, on warm paper-white. Loaded from app/globals.css with @config.
 */
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        creek: {
          50: '#eef6f8',
          100: '#d5e9ef',
          200: '#abd2de',
          300: '#78b4c7',
          400: '#4892ab',
          500: '#2d7590',
          600: '#215d75',
          700: '#1c4b5f',
          800: '#183d4d',
          900: '#122e3a',
          950: '#0b1d25',
        },
        moss: { 50: '#f2f7ee', 100: '#e1edd8', 500: '#5c8a3a', 600: '#48702b', 700: '#385722' },
        ochre: { 50: '#fdf7e8', 100: '#f9eac1', 500: '#c98d12', 600: '#a5700c', 700: '#7d5410' },
        clay: { 50: '#fbefec', 100: '#f5d6cf', 500: '#b9462f', 600: '#9a3522', 700: '#792a1c' },
        paper: '#fbfaf6',
      },
      fontFamily: { sans: ['var(--font-runnel)', 'ui-sans-serif', 'system-ui', 'sans-serif'] },
    },
  },
};

export default config;
