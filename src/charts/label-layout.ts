/** A label's box, px: x and y of its top-left corner. */
export type Box = { x: number; y: number; width: number; height: number };

/** Rough width of a label set in the chart's sans at this size (average glyph ≈ 0.6 em). */
export const labelWidth = (text: string, fontSize: number): number => text.length * fontSize * 0.6;

export const overlaps = (a: Box, b: Box): boolean =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

/**
 * Places each label at the first of its candidate boxes that stays inside the plot and clear of
 * the boxes already taken (fixed labels first, then earlier ones); a label with no free place is
 * left out (null) rather than drawn over another.
 */
export function placeLabels(candidates: readonly Box[][], taken: readonly Box[], bounds: Box): (Box | null)[] {
  const placed: Box[] = [...taken];
  const inside = (b: Box) => b.x >= bounds.x && b.y >= bounds.y && b.x + b.width <= bounds.x + bounds.width && b.y + b.height <= bounds.y + bounds.height;
  return candidates.map((options) => {
    const free = options.find((box) => inside(box) && !placed.some((other) => overlaps(box, other)));
    if (free) placed.push(free);
    return free ?? null;
  });
}
