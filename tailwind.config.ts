import type { Config } from 'tailwindcss'

// Tokens are named for what they mean, never for a colour.
export default {
  content: ['./components/**/*.vue', './layouts/**/*.vue', './pages/**/*.vue', './app.vue', './error.vue'],
  theme: {
    extend: {
      colors: {
        surface: { DEFAULT: '#f7f6f2', raised: '#ffffff', sunken: '#eceae3' },
        ink: { DEFAULT: '#1d2327', muted: '#545d63', faint: '#5f686e' },
        rule: { DEFAULT: '#d4d1c7', strong: '#a9a59a' },
        accent: { DEFAULT: '#1f5f7a', strong: '#164659', soft: '#dcebf1' },
        current: { DEFAULT: '#2f6b3a', soft: '#e1eee2' },
        lapsing: { DEFAULT: '#8a5a00', soft: '#f7ecd2' },
        lapsed: { DEFAULT: '#a3322a', soft: '#f6dfdc' },
        draft: { DEFAULT: '#5a5475', soft: '#e9e6f2' },
      },
      fontFamily: {
        sans: ['"Source Sans 3"', 'system-ui', 'sans-serif'],
      },
      fontSize: {
        caption: ['0.75rem', { lineHeight: '1rem' }],
        body: ['0.875rem', { lineHeight: '1.25rem' }],
        lead: ['1rem', { lineHeight: '1.5rem' }],
        title: ['1.25rem', { lineHeight: '1.75rem', fontWeight: '600' }],
        display: ['1.625rem', { lineHeight: '2rem', fontWeight: '700' }],
      },
      spacing: {
        gutter: '1rem',
        touch: '2.75rem',
      },
      borderRadius: { card: '0.375rem' },
    },
  },
} satisfies Config
