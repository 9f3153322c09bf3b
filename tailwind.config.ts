import type { Config } from 'tailwindcss';

/**
 * Reachline's own palette: warm concrete greys with a single oxide-orange accent, and a
 * utilisation scale from calm to strong. Colour is never used alone: every use pairs it with
 * a number and a word. Text colours meet WCAG 2.2 AA (4.5:1) on white, concrete-50, -100 and -200
 * (the desk header and badges): concrete-500 6.6 / 6.1 / 5.6 / 4.6:1, concrete-600 7.6 / 7.0 / 6.4 / 5.3:1,
 * oxide-500 5.8 / 5.4 / 5.0:1 (not on -200; white on it 5.8:1), util-calm 5.4 / 5.0 / 4.6:1 (not on -200).
 */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        concrete: {
          50: '#f7f6f4',
          100: '#eeece8',
          200: '#dcd8d1',
          300: '#c3bdb3',
          400: '#a39b8f',
          500: '#635c53',
          600: '#5a534b',
          700: '#56504a',
          800: '#3d3935',
          900: '#28251f',
        },
        oxide: {
          50: '#fdf3ec',
          100: '#fae1cf',
          300: '#ef9c63',
          500: '#a94714',
          600: '#9a4012',
          700: '#873811',
        },
        util: {
          calm: '#4a735e',
          steady: '#8a9a4b',
          near: '#c99a2e',
          over: '#b3261e',
        },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
        mono: ['"IBM Plex Mono"', 'ui-monospace', 'monospace'],
      },
    },
  },
} satisfies Config;
