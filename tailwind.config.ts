import type { Config } from 'tailwindcss';

// Stepwell's own palette: warm paper, pine ink, a brass accent; step classes get their own hues plus labels.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}', './stores/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f6f4ee', deep: '#ebe7dc', edge: '#d8d2c2' },
        ink: { DEFAULT: '#1f2a27', soft: '#4a5853', faint: '#7a8580' },
        pine: { 50: '#eef5f2', 100: '#d5e7df', 500: '#2e6b5a', 600: '#245746', 700: '#1b4236' },
        brass: { 100: '#f4e8cc', 500: '#b08a2e', 700: '#7a5e1c' },
        downhill: { DEFAULT: '#2e6b5a', bg: '#e3f0ea' },
        marginal: { DEFAULT: '#a06a12', bg: '#f8ecd3' },
        uphill: { DEFAULT: '#a33b2b', bg: '#f6e0db' },
      },
      fontFamily: {
        sans: ['var(--font-body)', 'var(--font-greek)', 'system-ui', 'sans-serif'],
        mono: ['ui-monospace', 'SFMono-Regular', 'Menlo', 'monospace'],
      },
    },
  },
};

export default config;
