export type TimeDomain = [number, number];

/** The narrowest view the zoom allows, as a fraction of the whole run. */
export const MIN_ZOOM_FRACTION = 1e-4;

/** Keeps a view inside the run and at least MIN_ZOOM_FRACTION of it wide, sliding it rather than cutting it. */
export function clampDomain([a, b]: TimeDomain, [start, end]: TimeDomain): TimeDomain {
  const full = end - start;
  const span = Math.min(full, Math.max(Math.abs(b - a), full * MIN_ZOOM_FRACTION));
  let low = Math.min(a, b);
  if (low < start) low = start;
  if (low + span > end) low = end - span;
  return [low, low + span];
}

/** Narrows (factor < 1) or widens (factor > 1) the view around a time inside it, keeping that time in place. */
export function zoomAround(view: TimeDomain, full: TimeDomain, centreS: number, factor: number): TimeDomain {
  if (!(factor > 0)) throw new RangeError(`factor: must be greater than zero, got ${factor}`);
  const [a, b] = view;
  const c = Math.min(b, Math.max(a, centreS));
  return clampDomain([c - (c - a) * factor, c + (b - c) * factor], full);
}

/** Moves the view so it holds t, keeping its width; a view that already holds t is returned as it is. */
export function panToInclude(view: TimeDomain, full: TimeDomain, t: number): TimeDomain {
  const [a, b] = view;
  if (t >= a && t <= b) return view;
  const half = (b - a) / 2;
  return clampDomain([t - half, t + half], full);
}

/** True when the view shows the whole run. */
export function isFullView(view: TimeDomain, full: TimeDomain): boolean {
  return view[0] <= full[0] && view[1] >= full[1];
}
