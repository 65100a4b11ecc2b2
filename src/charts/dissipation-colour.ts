import { scaleLinear } from 'd3-scale';

/**
 * Stops of the dissipation scale, from no power (pale cream) to the map's highest (deep plum).
 * Every channel falls from one stop to the next, so lightness falls all the way along and the
 * map still reads from light to dark when printed in greyscale.
 */
export const POWER_STOPS = ['#FBF6E4', '#F0CE7A', '#D98A4E', '#A64B4C', '#3F2A46'] as const;

export type PowerScale = {
  /** Colour of a power, W (clamped to the domain). */
  colour: (powerW: number) => string;
  domain: [number, number];
  /** Nice legend ticks in W inside the domain. */
  ticks: number[];
};

/** A sequential colour scale over [0, highest] W, with about `tickCount` legend ticks. */
export function powerScale(highestW: number, tickCount = 5): PowerScale {
  const top = Number.isFinite(highestW) && highestW > 0 ? highestW : 1;
  const stops = POWER_STOPS.map((_, k) => (top * k) / (POWER_STOPS.length - 1));
  const scale = scaleLinear<string>().domain(stops).range(POWER_STOPS).clamp(true);
  const ticks = scaleLinear().domain([0, top]).ticks(tickCount);
  return { colour: (p) => scale(p), domain: [0, top], ticks };
}

/** `#rrggbb` or `rgb(r, g, b)` as 0–255 channels. */
export function parseColour(text: string): [number, number, number] {
  const hex = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(text);
  if (hex) return [parseInt(hex[1], 16), parseInt(hex[2], 16), parseInt(hex[3], 16)];
  const rgb = /^rgb\(\s*(\d+),\s*(\d+),\s*(\d+)\s*\)$/.exec(text);
  if (rgb) return [Number(rgb[1]), Number(rgb[2]), Number(rgb[3])];
  throw new RangeError(`colour: expected #rrggbb or rgb(r, g, b), got "${text}"`);
}

/**
 * Relative luminance of an sRGB colour, 0 (black) to 1 (white), as WCAG 2.1 defines it
 * (linearised channels weighted 0.2126, 0.7152, 0.0722): how light it prints in greyscale.
 */
export function relativeLuminance(text: string): number {
  const [r, g, b] = parseColour(text).map((c) => {
    const s = c / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** Ink that stays readable on a fill: dark on light cells, light on dark ones. */
export const inkOn = (fill: string): 'dark' | 'light' => (relativeLuminance(fill) > 0.28 ? 'dark' : 'light');
