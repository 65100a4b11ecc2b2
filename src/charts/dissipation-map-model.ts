import type { CellStatus } from '@/core/rails';

/** How a cell of the map is drawn: filled with its power's colour, or a neutral fill; and which overlay marks its state. */
export type CellMark = {
  fill: 'power' | 'neutral' | 'blank';
  /** Overlay pattern: hatch for a sagged output, lines, dots and cross-hatch for loads that are not served. */
  pattern: 'none' | 'hatch' | 'lines' | 'dots' | 'cross';
  /** Plain words for the legend and the read-out. */
  label: string;
};

const MARKS: Record<CellStatus, CellMark> = {
  ok: { fill: 'power', pattern: 'none', label: 'in regulation' },
  dropout: { fill: 'power', pattern: 'hatch', label: 'dropout: the output sags below the set point' },
  'current-limit': { fill: 'neutral', pattern: 'lines', label: 'current limit: the element cannot carry this load' },
  'over-capacity': { fill: 'neutral', pattern: 'dots', label: 'over capacity: the tap cannot supply this current' },
  'not-served': { fill: 'blank', pattern: 'cross', label: 'not served by any tap' },
};

/** The marks in the order the legend lists them (ok first, then by severity as the core orders them). */
export const CELL_STATUS_ORDER: readonly CellStatus[] = ['ok', 'dropout', 'current-limit', 'over-capacity', 'not-served'];

/**
 * How a cell is drawn. Dropout keeps its (sagged) power's colour under a hatch; cells with no
 * power (null) are never coloured as if they had one, whatever their status says.
 */
export function cellMark(status: CellStatus, powerW: number | null): CellMark {
  const mark = MARKS[status];
  if (!mark) throw new RangeError(`status: unknown cell status "${String(status)}"`);
  if (mark.fill === 'power' && (powerW === null || !Number.isFinite(powerW))) return { ...mark, fill: 'neutral' };
  return mark;
}

/** The statuses the map holds, in legend order. */
export function statusesPresent(status: readonly (readonly CellStatus[])[]): CellStatus[] {
  const seen = new Set<CellStatus>();
  for (const row of status) for (const s of row) seen.add(s);
  return CELL_STATUS_ORDER.filter((s) => seen.has(s));
}

/** Highest power on the map, W (0 when nothing dissipates). */
export function highestPower(powerW: readonly (readonly (number | null)[])[]): number {
  let top = 0;
  for (const row of powerW) for (const p of row) if (p !== null && Number.isFinite(p) && p > top) top = p;
  return top;
}

/**
 * Edges of the cells around each grid value: halfway to the neighbours, and half a step
 * beyond the ends, so every grid value sits at the centre of its cell.
 */
export function cellEdges(values: readonly number[]): number[] {
  const n = values.length;
  if (n === 0) return [];
  if (n === 1) return [values[0] - 0.5, values[0] + 0.5];
  const edges = [values[0] - (values[1] - values[0]) / 2];
  for (let k = 0; k + 1 < n; k++) edges.push((values[k] + values[k + 1]) / 2);
  edges.push(values[n - 1] + (values[n - 1] - values[n - 2]) / 2);
  return edges;
}

/** A straight piece of a tap boundary in grid units: between cells (v, i) and their neighbours. */
export type BoundaryEdge = { x0: number; y0: number; x1: number; y1: number };

/**
 * Edges where the tap giving the highest power changes between neighbouring cells, in data
 * units (V across, A up), for drawing the tap boundaries. Cells no tap serves (−1) draw none:
 * their own marks already set them apart.
 */
export function tapBoundaries(tap: readonly (readonly number[])[], voutV: readonly number[], ioutA: readonly number[]): BoundaryEdge[] {
  const xe = cellEdges(voutV);
  const ye = cellEdges(ioutA);
  const edges: BoundaryEdge[] = [];
  for (let v = 0; v < voutV.length; v++) {
    for (let i = 0; i < ioutA.length; i++) {
      const here = tap[v]?.[i] ?? -1;
      if (here < 0) continue;
      if (v + 1 < voutV.length) {
        const right = tap[v + 1]?.[i] ?? -1;
        if (right >= 0 && right !== here) edges.push({ x0: xe[v + 1], y0: ye[i], x1: xe[v + 1], y1: ye[i + 1] });
      }
      if (i + 1 < ioutA.length) {
        const above = tap[v]?.[i + 1] ?? -1;
        if (above >= 0 && above !== here) edges.push({ x0: xe[v], y0: ye[i + 1], x1: xe[v + 1], y1: ye[i + 1] });
      }
    }
  }
  return edges;
}

/** Where each tap gives the highest power, V: the span of outputs it covers at any current. */
export function tapRegions(tap: readonly (readonly number[])[], voutV: readonly number[], taps: number): ({ fromV: number; toV: number } | null)[] {
  const xe = cellEdges(voutV);
  const out: ({ fromV: number; toV: number } | null)[] = Array.from({ length: taps }, () => null);
  tap.forEach((row, v) => {
    for (const k of new Set(row)) {
      if (k < 0 || k >= taps) continue;
      const r = out[k];
      out[k] = r ? { fromV: Math.min(r.fromV, xe[v]), toV: Math.max(r.toV, xe[v + 1]) } : { fromV: xe[v], toV: xe[v + 1] };
    }
  });
  return out;
}

/** A run of neighbouring cells in one Vout column drawn alike, so a fine grid needs fewer shapes. */
export type CellRun = { v: number; iFrom: number; iTo: number; status: CellStatus; bin: number };

/**
 * Cells grouped into runs along the current axis that share a status and a colour bin (the
 * power scale cut into `bins` steps; −1 for cells drawn without a power colour).
 */
export function cellRuns(
  powerW: readonly (readonly (number | null)[])[],
  status: readonly (readonly CellStatus[])[],
  highestW: number,
  bins: number,
): CellRun[] {
  if (!(Number.isInteger(bins) && bins >= 1)) throw new RangeError(`bins: must be a whole number of 1 or more, got ${bins}`);
  const top = highestW > 0 ? highestW : 1;
  const runs: CellRun[] = [];
  powerW.forEach((row, v) => {
    let run: CellRun | null = null;
    row.forEach((p, i) => {
      const s = status[v]?.[i] ?? 'not-served';
      const mark = cellMark(s, p);
      const bin = mark.fill === 'power' && p !== null ? Math.min(bins - 1, Math.max(0, Math.floor((p / top) * bins))) : -1;
      if (run && run.status === s && run.bin === bin && run.iTo === i - 1) run.iTo = i;
      else {
        if (run) runs.push(run);
        run = { v, iFrom: i, iTo: i, status: s, bin };
      }
    });
    if (run) runs.push(run);
  });
  return runs;
}

/** The power a colour bin stands for: its middle, W. */
export const binPower = (bin: number, bins: number, highestW: number) => ((bin + 0.5) / bins) * (highestW > 0 ? highestW : 1);

/** The grid cell nearest to a point in data units, or null outside the grid. */
export function cellAt(voutV: readonly number[], ioutA: readonly number[], v: number, i: number): { v: number; i: number } | null {
  const xe = cellEdges(voutV);
  const ye = cellEdges(ioutA);
  const find = (edges: number[], x: number) => {
    if (edges.length < 2 || x < edges[0] || x > edges[edges.length - 1]) return -1;
    for (let k = 0; k + 1 < edges.length; k++) if (x <= edges[k + 1]) return k;
    return edges.length - 2;
  };
  const cv = find(xe, v);
  const ci = find(ye, i);
  return cv < 0 || ci < 0 ? null : { v: cv, i: ci };
}
