import type { Config } from 'tailwindcss';

/**
 * Chordline design tokens. Warm concrete greys for surfaces, one deep blue-green for the brand and
 * primary actions, amber only for "look here", a green for pass.
 */
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}', './scene/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        concrete: {
          50: '#f7f6f3',
          100: '#efede8',
          200: '#e0ddd5',
          300: '#c9c4b9',
          400: '#a8a295',
          500: '#878174',
          600: '#6b665b',
          700: '#524e46',
          800: '#3a3732',
          900: '#24221f',
        },
        brand: {
          50: '#eaf5f3',
          100: '#cce8e3',
          300: '#6fbcae',
          500: '#1f7f70',
          600: '#17695d',
          700: '#12544b',
          800: '#0e4039',
          900: '#0a2e29',
        },
        caution: { 100: '#fdf0d5', 500: '#d98e04', 700: '#8a5a00' },
        pass: { 100: '#e1f3e4', 600: '#2e7d3c', 700: '#24622f' },
        fail: { 100: '#fbe4e1', 600: '#b3362a' },
      },
      fontFamily: {
        sans: ['"Source Sans 3"', 'system-ui', 'sans-serif'],
      },
      fontSize: {
        reading: ['1.5rem', { lineHeight: '2rem' }],
      },
    },
  },
};

export default config;
