import { formatDuration, formatQuantity } from '@/features/studies/quantity-format';

import type { CommentAnchor } from './types';

/** "at 38 s" on the heat curves; "SOA point 12 V, 3 A" on the SOA chart. */
export function anchorLabel(anchor: CommentAnchor): string {
  if (anchor.kind === 'time') return `at ${formatDuration(anchor.timeS)}`;
  return `SOA point ${formatQuantity(anchor.vceV, 'V')}, ${formatQuantity(anchor.icA, 'A')}`;
}
