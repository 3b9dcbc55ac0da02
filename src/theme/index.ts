/** Design tokens. The colours are shared with the PDF reports. */
export { colors, severityFill, severityInk, unloggedFill } from '@/shared/theme/colours';

export const spacing = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 };
export const radius = { sm: 6, md: 10, lg: 16, pill: 999 };

export const fonts = {
  regular: 'AtkinsonHyperlegible_400Regular',
  bold: 'AtkinsonHyperlegible_700Bold',
};
export const type = {
  caption: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 18 },
  body: { fontFamily: fonts.regular, fontSize: 16, lineHeight: 23 },
  label: { fontFamily: fonts.bold, fontSize: 14, lineHeight: 20 },
  title: { fontFamily: fonts.bold, fontSize: 20, lineHeight: 26 },
  heading: { fontFamily: fonts.bold, fontSize: 26, lineHeight: 32 },
};

/** Wide layout (side navigation, diagram and zone sheet side by side) from this width up. */
export const breakpoints = { wide: 1024 };
