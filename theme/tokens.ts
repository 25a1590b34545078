/**
 * Tunefork's design tokens. The palette is our own: a deep "workbench teal" accent on warm
 * paper-grey surfaces, with an amber caution colour for safety notes. Every pair used for text
 * meets WCAG AA contrast (4.5:1) on its surface.
 */
export type Palette = {
  background: string;
  surface: string;
  surfaceRaised: string;
  border: string;
  text: string;
  textMuted: string;
  accent: string;
  accentText: string;
  accentSoft: string;
  success: string;
  successSoft: string;
  danger: string;
  dangerSoft: string;
  caution: string;
  cautionSoft: string;
  focus: string;
};

export const palettes: { light: Palette; dark: Palette } = {
  light: {
    background: '#F4F2EE',
    surface: '#FFFFFF',
    surfaceRaised: '#FBFAF8',
    border: '#D9D5CE',
    text: '#1C1F22',
    textMuted: '#545A61',
    accent: '#0B6A66',
    accentText: '#FFFFFF',
    accentSoft: '#D7EEEC',
    success: '#1E6B3A',
    successSoft: '#DDF1E3',
    danger: '#A3241B',
    dangerSoft: '#FBE4E1',
    caution: '#7A4F00',
    cautionSoft: '#FBEFD5',
    focus: '#2C5FD6',
  },
  dark: {
    background: '#121517',
    surface: '#1B1F22',
    surfaceRaised: '#23282C',
    border: '#353C42',
    text: '#ECEEF0',
    textMuted: '#A8B0B8',
    accent: '#5CCFC6',
    accentText: '#0C1B1A',
    accentSoft: '#17393A',
    success: '#7BD69A',
    successSoft: '#173222',
    danger: '#FF8A80',
    dangerSoft: '#3D1A18',
    caution: '#F2C063',
    cautionSoft: '#3A2E14',
    focus: '#8AB0FF',
  },
};

/** Spacing steps in px; use these, never raw numbers. */
export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;

export const radius = { sm: 6, md: 10, lg: 16, pill: 999 } as const;

export const fonts = {
  regular: 'AtkinsonHyperlegible_400Regular',
  bold: 'AtkinsonHyperlegible_700Bold',
} as const;

/** Three sizes cover a screen: titles, body, captions. */
export const type = {
  title: { fontSize: 24, lineHeight: 30, fontFamily: fonts.bold },
  heading: { fontSize: 18, lineHeight: 24, fontFamily: fonts.bold },
  body: { fontSize: 16, lineHeight: 22, fontFamily: fonts.regular },
  caption: { fontSize: 13, lineHeight: 18, fontFamily: fonts.regular },
} as const;

export const layout = {
  /** At and above this width the tab bar becomes a side rail and content a centred column. */
  wideBreakpoint: 900,
  contentMaxWidth: 720,
  railWidth: 208,
  tabBarHeight: 60,
  minTouchTarget: 44,
  avatarSmall: 44,
  avatarLarge: 72,
} as const;
