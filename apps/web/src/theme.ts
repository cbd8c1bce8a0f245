import { createTheme, type CSSVariablesResolver, type MantineColorsTuple } from '@mantine/core';

// Drafting-office palette: iron-gall ink for structure, warm vellum for surfaces, a redline
// vermilion reserved for markup and destructive actions, a verdigris green for "within limits".
const ink: MantineColorsTuple = ['#eef2f7', '#dce4ee', '#b7c6d9', '#90a7c3', '#6f8cb0', '#5779a2', '#49699a', '#3a5783', '#2d4669', '#1c2f4a'];
const redline: MantineColorsTuple = ['#fdf0ec', '#f9ddd4', '#f1b8a6', '#e99177', '#e17050', '#dc5b38', '#c94a29', '#a83c20', '#87301a', '#652412'];
const verdigris: MantineColorsTuple = ['#edf7f3', '#d8ece4', '#acd7c6', '#7ec1a6', '#57ad8b', '#3f9f79', '#2f8a67', '#257153', '#1b5941', '#10402e'];
const graphite: MantineColorsTuple = ['#f7f6f2', '#efede7', '#e3e0d8', '#d0ccc1', '#aca79a', '#888376', '#6b675c', '#524f46', '#3a3832', '#25241f'];
const amber: MantineColorsTuple = ['#fdf6e6', '#f8eac7', '#f0d48d', '#e8bd52', '#e1a928', '#d99a12', '#bb820c', '#966809', '#714e07', '#4d3504'];

export const surfaces = {
  paper: '#f5f3ed',
  sheet: '#fffefb',
  rule: '#dcd8cd',
  inkDeep: '#15243a',
} as const;

export const theme = createTheme({
  primaryColor: 'ink',
  primaryShade: { light: 8, dark: 4 },
  colors: {
    ink,
    redline,
    verdigris,
    amber,
    gray: graphite,
    red: redline,
    green: verdigris,
    yellow: amber,
    blue: ink,
  },
  black: '#1d1c18',
  white: surfaces.sheet,
  fontFamily: '"Source Sans 3", "Segoe UI", "Limitbook Symbols", system-ui, sans-serif',
  fontFamilyMonospace: '"Source Code Pro", "Limitbook Symbols", ui-monospace, "SFMono-Regular", Menlo, monospace',
  headings: {
    fontFamily: 'Merriweather, Georgia, "Limitbook Symbols", "Times New Roman", serif',
    fontWeight: '700',
    sizes: {
      h1: { fontSize: '1.75rem', lineHeight: '1.3' },
      h2: { fontSize: '1.375rem', lineHeight: '1.35' },
      h3: { fontSize: '1.125rem', lineHeight: '1.4' },
      h4: { fontSize: '1rem', lineHeight: '1.45' },
    },
  },
  fontSizes: { xs: '0.8125rem', sm: '0.9375rem', md: '1rem', lg: '1.125rem', xl: '1.25rem' },
  defaultRadius: 'sm',
  radius: { xs: '2px', sm: '3px', md: '5px', lg: '8px', xl: '12px' },
  cursorType: 'pointer',
  focusRing: 'auto',
  components: {
    Button: { defaultProps: { fw: 600 } },
    Paper: { defaultProps: { withBorder: true, radius: 'sm' } },
    Card: { defaultProps: { withBorder: true, radius: 'sm' } },
    Badge: { defaultProps: { radius: 'xs', variant: 'light' } },
    Modal: {
      defaultProps: { radius: 'sm', overlayProps: { backgroundOpacity: 0.45, blur: 1 } },
      styles: { title: { fontFamily: 'Merriweather, Georgia, "Limitbook Symbols", serif', fontWeight: 700, fontSize: '1.125rem' } },
    },
    TextInput: { defaultProps: { radius: 'sm' } },
    PasswordInput: { defaultProps: { radius: 'sm' } },
    Tooltip: { defaultProps: { withArrow: true, openDelay: 250 } },
    Table: { defaultProps: { verticalSpacing: 'sm', horizontalSpacing: 'md' } },
  },
  other: { surfaces },
});

export const cssVariablesResolver: CSSVariablesResolver = () => ({
  variables: { '--lb-paper': surfaces.paper, '--lb-sheet': surfaces.sheet, '--lb-rule': surfaces.rule, '--lb-ink-deep': surfaces.inkDeep },
  light: { '--mantine-color-body': surfaces.paper, '--mantine-color-default-border': surfaces.rule },
  dark: {},
});
