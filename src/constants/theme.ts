import type { Theme } from 'expo-router';

/**
 * Design tokens. Every visual value in the app comes from here so the look can be
 * tuned in one place. The palette is muted on purpose: the data (temperatures,
 * margins, states) should carry the colour, not the chrome.
 */
export const color = {
  canvas: '#F3F4F1',
  surface: '#FFFFFF',
  surfaceMuted: '#EAECE7',
  sidebar: '#1E2A2F',
  sidebarText: '#D7DEDD',
  sidebarMuted: '#8FA0A2',
  sidebarActive: '#2C3C42',
  ink: '#1B2226',
  inkMuted: '#56626A',
  inkFaint: '#7F8A90',
  border: '#D5D9D2',
  borderStrong: '#B4BBB3',
  accent: '#1E6270',
  accentPressed: '#174B56',
  accentSoft: '#DCEBEE',
  onAccent: '#FFFFFF',
  danger: '#A3312A',
  dangerSoft: '#F7E3E1',
  warning: '#8A5A00',
  warningSoft: '#F6EBD3',
  success: '#2E6B3C',
  successSoft: '#DFEEE1',
  info: '#2F5888',
  infoSoft: '#E0E8F3',
  focus: '#3D8FA0',
  /** Dims the page behind a menu or sheet. */
  scrim: 'rgba(27, 34, 38, 0.35)',
} as const;

/**
 * Chart palette: one hue per device (junction and case share it and differ by line style),
 * warm neutrals for sinks and air, and the two limit lines. Chosen to stay apart for common
 * colour-vision deficiencies; every series also has its own dash pattern.
 */
export const chartColor = {
  devices: ['#1E6270', '#B4541F', '#6A4C93', '#4F6B1C', '#A13D63', '#2F5888'],
  sinks: ['#7A5C3E', '#5C6B73', '#8C6D1F'],
  enclosure: '#6E7F86',
  ambient: '#9AA3A8',
  tjMax: '#A3312A',
  target: '#8A5A00',
  grid: '#E4E7E1',
  axis: '#B4BBB3',
  cursor: '#1B2226',
  selection: 'rgba(30, 98, 112, 0.12)',
} as const;

export const spacing = {
  xxs: 2,
  xs: 4,
  sm: 8,
  md: 12,
  lg: 16,
  xl: 24,
  xxl: 32,
  xxxl: 48,
} as const;

export const radius = {
  sm: 4,
  md: 6,
  lg: 10,
  pill: 999,
} as const;

/** Font family names as registered by `useFonts` in the root layout. */
export const fontFamily = {
  regular: 'IBMPlexSans_400Regular',
  medium: 'IBMPlexSans_500Medium',
  semiBold: 'IBMPlexSans_600SemiBold',
  bold: 'IBMPlexSans_700Bold',
  mono: 'IBMPlexMono_400Regular',
  monoMedium: 'IBMPlexMono_500Medium',
} as const;

export const fontSize = {
  xs: 12,
  sm: 13,
  md: 15,
  lg: 17,
  xl: 20,
  xxl: 24,
  display: 30,
} as const;

export const lineHeight = {
  xs: 16,
  sm: 18,
  md: 22,
  lg: 24,
  xl: 28,
  xxl: 32,
  display: 38,
} as const;

/** Window widths (px) where the layout changes. */
export const breakpoint = {
  /** Sidebar shell and table views from here up. */
  wide: 1024,
} as const;

export const size = {
  sidebarWidth: 248,
  bottomNavHeight: 58,
  contentMaxWidth: 1120,
  formMaxWidth: 420,
  readableMaxWidth: 760,
  touchTarget: 44,
} as const;

/** The same palette handed to the router so its containers match the app. */
export const navigationTheme: Theme = {
  dark: false,
  colors: {
    primary: color.accent,
    background: color.canvas,
    card: color.surface,
    text: color.ink,
    border: color.border,
    notification: color.danger,
  },
  fonts: {
    regular: { fontFamily: fontFamily.regular, fontWeight: '400' },
    medium: { fontFamily: fontFamily.medium, fontWeight: '500' },
    bold: { fontFamily: fontFamily.semiBold, fontWeight: '600' },
    heavy: { fontFamily: fontFamily.bold, fontWeight: '700' },
  },
};
