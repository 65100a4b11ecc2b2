import type { ToleranceResult } from '@/core/tolerance';

/** What the sweep worker is told, and what it answers. */
export type SweepRequest = { id: number; document: unknown; input: Record<string, unknown> };
export type SweepReply =
  | { id: number; kind: 'progress'; done: number; total: number }
  | { id: number; kind: 'done'; result: ToleranceResult }
  | { id: number; kind: 'failed'; message: string; field?: string };
