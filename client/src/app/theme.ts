import { createTheme, type CSSVariablesResolver, type MantineColorsTuple } from '@mantine/core';

/** Reed: a muted moss-olive green, Pondwright's primary colour. */
const reed: MantineColorsTuple = [
  '#f3f5ec',
  '#e4e9d5',
  '#cbd5ad',
  '#b0c083',
  '#98ad61',
  '#87a04b',
  '#71883c',
  '#5d7031',
  '#4a5927',
  '#36411c',
];

/** Clay: a fired terracotta, used sparingly for accents and warnings that are not errors. */
const clay: MantineColorsTuple = [
  '#fbf1ec',
  '#f4ddd2',
  '#e9bba6',
  '#dd9877',
  '#d37b53',
  '#cc6a3f',
  '#b85a31',
  '#9a4a28',
  '#7c3c21',
  '#5e2d19',
];

/** Stone: warm grey neutrals; it also replaces the default greys so borders and text stay warm. */
const stone: MantineColorsTuple = [
  '#f8f7f4',
  '#efede8',
  '#e2dfd8',
  '#cdc9bf',
  '#b2ada1',
  '#958f82',
  '#787266',
  '#5e594f',
  '#45413a',
  '#2e2b26',
];

/** Warm charcoal for the dark colour scheme. */
const dark: MantineColorsTuple = [
  '#d6d2c9',
  '#b5b0a5',
  '#8f8a7f',
  '#6b665c',
  '#4a463f',
  '#3a3732',
  '#2d2a26',
  '#24221f',
  '#1c1a18',
  '#141312',
];

const fontStack =
  'Inter, ui-sans-serif, system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif';

export const theme = createTheme({
  colors: { reed, clay, stone, gray: stone, dark },
  primaryColor: 'reed',
  // Shade 7 keeps white button text above 4.5:1 contrast on the moss green.
  primaryShade: { light: 7, dark: 5 },
  autoContrast: true,
  fontFamily: fontStack,
  headings: {
    fontFamily: fontStack,
    fontWeight: '600',
  },
  defaultRadius: 'md',
  cursorType: 'pointer',
  other: {
    headerHeight: 60,
    navbarWidth: 240,
  },
  components: {
    Button: { defaultProps: { fw: 600 } },
    Paper: { defaultProps: { withBorder: true, radius: 'md' } },
    Table: { defaultProps: { verticalSpacing: 'sm', highlightOnHover: true } },
    Notification: { defaultProps: { radius: 'md' } },
  },
});

/**
 * A faint stone page background so white cards read as cards. Text keeps 4.5:1 contrast (WCAG 1.4.3)
 * on it and on the pale panels: dimmed text and placeholders a shade darker than Mantine's, and the
 * text of light yellow alerts and badges a dark amber (Mantine's darkest yellow reads 2.7:1 there).
 */
export const cssVariablesResolver: CSSVariablesResolver = () => ({
  variables: {},
  light: {
    '--mantine-color-body': stone[0],
    '--mantine-color-dimmed': stone[7],
    '--mantine-color-placeholder': stone[6],
    '--mantine-color-yellow-light-color': '#7a4f00',
  },
  dark: {
    '--mantine-color-body': dark[8],
  },
});
