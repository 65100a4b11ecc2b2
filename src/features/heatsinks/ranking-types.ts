import type { CandidateResult, RankingOptions, RankingResult, SortKey } from '@/core/heatsink';

/**
 * JSON turns NaN and ±Infinity into null: an excluded sink's margin, an unbounded required
 * Rθsa (nothing dissipated). These fields may therefore be null over the wire.
 */
type Nullable<T, K extends keyof T> = Omit<T, K> & { [P in K]: T[P] | null };

export type RankedSink = Nullable<CandidateResult, 'worstMarginK'> & {
  steady?: { marginK: number | null; passes: boolean; rsaKPerW: number | null };
};

export type RankingJson = Omit<RankingResult, 'required' | 'ranked' | 'passing' | 'failing' | 'excluded' | 'smallest' | 'steadyChoice'> & {
  required: Nullable<RankingResult['required'], 'rsaKPerW'>;
  ranked: RankedSink[];
  passing: RankedSink[];
  failing: RankedSink[];
  excluded: RankedSink[];
  smallest: RankedSink | null;
  steadyChoice: RankedSink | null;
};

/** Body of `GET /api/studies/:id/ranking`. */
export type RankingResponse = {
  sinkId: string;
  /** Catalogue rows offered to the ranking. */
  candidates: number;
  options: RankingOptions;
  notes: string[];
  result: RankingJson;
};

/** The what-ifs a reader sets; empty text keeps the study's own value. */
export type RankingQuery = {
  sink: string;
  sort: SortKey;
  /** null: still air; a number: that air speed, m/s. */
  airSpeedMPerS: number | null;
  ambientC: number | null;
  marginK: number | null;
};
