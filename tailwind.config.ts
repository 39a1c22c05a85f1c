import type { Config } from 'tailwindcss';

// Antinode's look: paper-white and graphite surfaces, one warm accent for risk and one
// cool accent for selection. Every state also carries a text label or a shape.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f7f6f2', raised: '#ffffff', sunk: '#eeece6' },
        graphite: { DEFAULT: '#25282d', 700: '#3a3e45', 500: '#5d626b', 300: '#a3a7ae', 200: '#cfd1d4', 100: '#e3e4e6' },
        risk: { DEFAULT: '#b5541b', soft: '#f6e3d4', ink: '#7a3510' },
        select: { DEFAULT: '#2d6a96', soft: '#dde9f2', ink: '#1b4564' },
        ok: { DEFAULT: '#3f6b45', soft: '#e0ebe1' },
      },
      borderRadius: { DEFAULT: '4px' },
      boxShadow: { panel: '0 1px 2px rgba(37,40,45,0.06), 0 0 0 1px rgba(37,40,45,0.08)' },
    },
  },
};

export default config;
