import type { Config } from 'tailwindcss';

/**
 * Reachline's own palette: warm concrete greys with a single oxide-orange accent, and a
 * utilisation scale from calm to strong. Colour is never used alone: every use pairs it with
 * a number and a word. Text colours meet WCAG 2.2 AA on white and on concrete-50 (4.5:1):
 * concrete-500 4.8:1, oxide-500 4.9:1 (and white on it 5.3:1), util-calm 5.0:1.
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
          500: '#746c61',
          600: '#6b645a',
          700: '#56504a',
          800: '#3d3935',
          900: '#28251f',
        },
        oxide: {
          50: '#fdf3ec',
          100: '#fae1cf',
          300: '#ef9c63',
          500: '#b34d16',
          600: '#a94714',
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
