/** Claybank's visual identity: warm clay accent on cool ink, dense type for engineering tables. */
/** @type {import('tailwindcss').Config} */
export default {
  content: ['./src/**/*.{astro,html,js,jsx,ts,tsx,md}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"Public Sans"', 'system-ui', 'sans-serif'],
      },
      colors: {
        ink: {
          50: '#f3f5f7',
          100: '#e4e8ec',
          200: '#c9d1d9',
          300: '#9eabb8',
          400: '#6f7f90',
          500: '#526273',
          600: '#3e4c5b',
          700: '#2f3a46',
          800: '#212a33',
          900: '#151b21',
        },
        clay: {
          50: '#fbf5f0',
          100: '#f4e4d6',
          200: '#e8c7ab',
          300: '#d9a47c',
          400: '#c98556',
          500: '#b56b3d',
          600: '#975632',
          700: '#78432a',
          800: '#5c3423',
          900: '#3f241a',
        },
        tide: {
          50: '#eef7f6',
          100: '#d3ebe8',
          200: '#a6d6d0',
          300: '#72bab2',
          400: '#479b93',
          500: '#2f7f78',
          600: '#246660',
          700: '#1e524d',
          800: '#18403c',
          900: '#112e2b',
        },
        caution: { 50: '#fdf8e8', 100: '#f9ecc2', 300: '#e9c25a', 500: '#b8891a', 700: '#7a5a10', 900: '#3f2f08' },
        fault: { 50: '#fcf1f0', 100: '#f6d9d6', 500: '#b5402f', 700: '#862d21' },
        sound: { 50: '#eff7ee', 100: '#d6ebd3', 500: '#3b7d35', 700: '#2a5a26' },
      },
      fontSize: {
        '2xs': ['0.6875rem', { lineHeight: '1rem' }],
      },
      maxWidth: { page: '80rem' },
    },
  },
  plugins: [],
};
