import type { Config } from 'tailwindcss';

// Pinwork's own palette: a calm slate-teal "ink" for structure and text, a warm
// "paper" ground, and one warm "signal" colour reserved for loads and forces so
// that, on every screen, orange means "a force acts here".
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: {
          50: '#eef5f5',
          100: '#d5e6e6',
          200: '#abcdce',
          300: '#7aaeb0',
          400: '#4f8c8f',
          500: '#357174',
          600: '#285a5e',
          700: '#20494d',
          800: '#1a3a3e',
          900: '#142e32',
          950: '#0c1e21',
        },
        paper: {
          50: '#fbfaf6',
          100: '#f5f2ea',
          200: '#e9e3d5',
          300: '#d8cfba',
        },
        signal: {
          50: '#fff5ec',
          100: '#ffe6cf',
          200: '#fcc99c',
          300: '#f7a560',
          400: '#ef8436',
          500: '#dd6a1f',
          600: '#bb5215',
          700: '#933f14',
          800: '#763416',
          900: '#602d15',
        },
        verdict: {
          pass: '#2b7354',
          warn: '#9a6212',
          fail: '#b42318',
        },
      },
      fontFamily: {
        sans: ['Manrope', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
      maxWidth: {
        page: '72rem',
      },
    },
  },
} satisfies Config;
