import { createTheme, type MantineColorsTuple } from '@mantine/core';

// "Lagoon": Lockstep's own deep blue-green, lightest to darkest. Calm on white, readable as
// text at shade 7 and above, and nothing like the black-and-neon of a device display.
const lagoon: MantineColorsTuple = [
  '#eaf5f5',
  '#d6e9ea',
  '#abd2d4',
  '#7dbabd',
  '#57a5a9',
  '#3f979c',
  '#2f8a90',
  '#1f757b',
  '#11666c',
  '#00565c',
];

// A cool, slightly blue grey for surfaces and borders, so the teal reads as the only accent.
const slate: MantineColorsTuple = [
  '#f3f6f8',
  '#e6ebef',
  '#cbd4db',
  '#aebcc6',
  '#95a7b4',
  '#8599a8',
  '#7b91a1',
  '#697e8d',
  '#5c707e',
  '#4b6170',
];

export const theme = createTheme({
  primaryColor: 'lagoon',
  primaryShade: { light: 7, dark: 5 },
  colors: { lagoon, slate },
  fontFamily: 'Inter, sans-serif',
  fontFamilyMonospace: 'ui-monospace, SFMono-Regular, Menlo, Consolas, monospace',
  headings: {
    fontFamily: 'Inter, sans-serif',
    fontWeight: '600',
    sizes: {
      h1: { fontSize: '1.625rem', lineHeight: '1.3' },
      h2: { fontSize: '1.25rem', lineHeight: '1.35' },
      h3: { fontSize: '1.0625rem', lineHeight: '1.4' },
    },
  },
  defaultRadius: 'sm',
  cursorType: 'pointer',
  focusRing: 'auto',
  components: {
    Table: {
      defaultProps: { verticalSpacing: 6, horizontalSpacing: 'sm', fz: 'sm' },
    },
    Badge: {
      defaultProps: { radius: 'sm', tt: 'none', fw: 500 },
    },
    Button: {
      defaultProps: { fw: 500 },
    },
    PasswordInput: {
      // Mantine's own toggle name contains "password", which makes a second match for the
      // field's label in assistive tech and in tests.
      defaultProps: { visibilityToggleButtonProps: { 'aria-label': 'Show or hide the typed characters' } },
    },
    Modal: {
      defaultProps: { centered: true, overlayProps: { backgroundOpacity: 0.4, blur: 1 } },
      styles: { title: { fontWeight: 600, fontSize: 'var(--mantine-font-size-lg)' } },
    },
  },
});
