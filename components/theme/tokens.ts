// Design tokens for Ligandry: the only place colours, spacing and type sizes are written down.

/** Spacing steps in density-independent pixels. */
export const space = { xxs: 2, xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

/** Corner radii in density-independent pixels. */
export const radius = { sm: 4, md: 8, lg: 14, pill: 999 } as const;

/** Font family names as registered by useFonts (Source Sans 3, bundled, one face per weight). */
export const fonts = {
  regular: 'SourceSans3_400Regular',
  semibold: 'SourceSans3_600SemiBold',
  bold: 'SourceSans3_700Bold',
} as const;

/** Type scale: font size and line height in pixels. */
export const type = {
  caption: { fontSize: 13, lineHeight: 18 },
  body: { fontSize: 16, lineHeight: 24 },
  label: { fontSize: 14, lineHeight: 20 },
  title: { fontSize: 22, lineHeight: 28 },
  display: { fontSize: 28, lineHeight: 34 },
} as const;

/** Width in pixels from which the shell shows a side rail and two panes instead of bottom tabs. */
export const WIDE_BREAKPOINT = 900;

/** Semantic colours; every screen asks for a role, never a raw value. */
export type Palette = {
  background: string;
  surface: string;
  surfaceRaised: string;
  border: string;
  text: string;
  textMuted: string;
  primary: string;
  onPrimary: string;
  primarySoft: string;
  accent: string;
  caution: string;
  cautionSoft: string;
  danger: string;
  dangerSoft: string;
  ok: string;
  okSoft: string;
  rail: string;
  onRail: string;
  onRailMuted: string;
  railActive: string;
  railHover: string;
  railOk: string;
  railCaution: string;
  railDanger: string;
};

// Light: warm paper, deep lagoon ink for actions, a verdigris-to-copper pairing of our own.
const light: Palette = {
  background: '#F6F4EF',
  surface: '#FFFFFF',
  surfaceRaised: '#FBFAF7',
  border: '#D9D4C9',
  text: '#1C232B',
  textMuted: '#56606B',
  primary: '#1E5B6E',
  onPrimary: '#FFFFFF',
  primarySoft: '#DCEBEE',
  accent: '#9A4E24',
  caution: '#8A5A00',
  cautionSoft: '#FBEFD2',
  danger: '#A3262E',
  dangerSoft: '#F8DEDF',
  ok: '#2E6B3F',
  okSoft: '#DDEFE1',
  rail: '#1E3440',
  onRail: '#F2EFE8',
  onRailMuted: '#A9B7BE',
  railActive: '#2F5160',
  railHover: '#27424F',
  railOk: '#8FD3A1',
  railCaution: '#EEC15A',
  railDanger: '#F39399',
};

// Dark: slate night with the same roles lifted for contrast.
const dark: Palette = {
  background: '#11161B',
  surface: '#182028',
  surfaceRaised: '#1F2933',
  border: '#2F3B46',
  text: '#E9EDF1',
  textMuted: '#A3AEB9',
  primary: '#7CC1D4',
  onPrimary: '#0C1A20',
  primarySoft: '#1D3A44',
  accent: '#E0956A',
  caution: '#E9B949',
  cautionSoft: '#3A2F14',
  danger: '#F0868C',
  dangerSoft: '#40202A',
  ok: '#7FC992',
  okSoft: '#1C3424',
  rail: '#0C1116',
  onRail: '#E9EDF1',
  onRailMuted: '#8D99A5',
  railActive: '#1F3340',
  railHover: '#17232C',
  railOk: '#7FC992',
  railCaution: '#E9B949',
  railDanger: '#F0868C',
};

/** Both palettes, keyed by colour scheme. */
export const palettes = { light, dark } as const;

/** Name of a colour scheme, as the device reports it. */
export type SchemeName = keyof typeof palettes;
