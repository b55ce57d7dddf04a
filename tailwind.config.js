/**
 * Gelwright's own look: warm paper, ink text, a deep fjord-teal for action, amber for
 * caution. One type family (IBM Plex Sans, shipped with the app) on a calm scale.
 * Loaded from src/styles/index.css with @config.
 */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
      },
      fontSize: {
        xs: ['0.75rem', { lineHeight: '1.1rem' }],
        sm: ['0.8125rem', { lineHeight: '1.25rem' }],
        base: ['0.9375rem', { lineHeight: '1.5rem' }],
        lg: ['1.125rem', { lineHeight: '1.6rem' }],
        xl: ['1.375rem', { lineHeight: '1.8rem' }],
        '2xl': ['1.75rem', { lineHeight: '2.2rem' }],
      },
      colors: {
        paper: '#f6f5f1',
        panel: '#ffffff',
        ink: { DEFAULT: '#1c2630', soft: '#4a5662', faint: '#636d77' },
        line: { DEFAULT: '#dcd9d0', strong: '#c4c0b4' },
        fjord: { 50: '#eaf3f4', 100: '#d3e6e9', 300: '#7fb0b9', 500: '#2c6e7f', 600: '#235a68', 700: '#1b4652' },
        amber: { 50: '#fbf4e6', 100: '#f4e2bd', 500: '#b7791f', 700: '#7f5313' },
        brick: { 50: '#fbeceb', 500: '#b23b3b', 700: '#862b2b' },
        leaf: { 50: '#eaf4ee', 500: '#2f7d52', 700: '#235e3d' },
      },
      borderRadius: { card: '10px' },
      boxShadow: { card: '0 1px 2px rgba(28,38,48,0.06), 0 1px 8px rgba(28,38,48,0.04)' },
    },
  },
};
