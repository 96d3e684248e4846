// Joistwright's visual identity: spruce (deep slate-green) for structure, larch (warm timber) for accents,
// ash (warm grey) for neutrals, and a few quiet hues for job states. Loaded from app/globals.css via @config.
import type { Config } from 'tailwindcss';

const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}', './canvas/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        // Deep slate-green: the shell, primary actions, links. White on 700 is 10:1, on 600 is 7.5:1.
        spruce: {
          50: '#f0f5f3',
          100: '#dbe8e3',
          200: '#b8d1c8',
          300: '#8db3a6',
          400: '#5f8f81',
          500: '#437466',
          600: '#2f5d51',
          700: '#24493f',
          800: '#1d3a33',
          900: '#17302a',
          950: '#0e1f1b',
        },
        // Warm larch timber: highlights, the logo's boards, quoted jobs. 800 on 50 is 8:1.
        larch: {
          50: '#fcf7f0',
          100: '#f7ead8',
          200: '#eed3b0',
          300: '#e3b783',
          400: '#d49858',
          500: '#c07c3a',
          600: '#a65f26',
          700: '#8a4f1f',
          800: '#6a3e21',
          900: '#56341e',
          950: '#2f1a0e',
        },
        // Warm grey neutrals: text, borders, surfaces. 600 on 50 is 5.5:1 (secondary text).
        ash: {
          50: '#faf7f2',
          100: '#f2eee8',
          200: '#e4ded5',
          300: '#cfc7bb',
          400: '#a89f92',
          500: '#857c70',
          600: '#6b6257',
          700: '#554e46',
          800: '#3d3833',
          900: '#29251f',
          950: '#1a1714',
        },
        // Job-state hues (one each, used as 100 background / 800 text / 500 dot).
        tarn: { 100: '#e1ecf4', 500: '#3f7fae', 800: '#1f4966' },
        heather: { 100: '#eee6f5', 500: '#8458a8', 800: '#543070' },
        moss: { 100: '#ebf1d9', 500: '#6f8f26', 800: '#3f5314' },
        ember: { 100: '#fde5d3', 500: '#d9662a', 800: '#7c3410' },
        clay: {
          50: '#fdf3f1',
          100: '#f8e1de',
          200: '#f0c2bc',
          500: '#c24536',
          600: '#a93527',
          700: '#8c2a1f',
          800: '#7f231b',
        },
      },
      fontFamily: {
        sans: ['var(--font-inter)', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
      minHeight: { touch: '2.75rem' },
      minWidth: { touch: '2.75rem' },
      boxShadow: {
        card: '0 1px 2px rgb(41 37 31 / 0.06), 0 1px 3px rgb(41 37 31 / 0.08)',
        lift: '0 10px 30px -10px rgb(14 31 27 / 0.35)',
      },
    },
  },
};

export default config;
