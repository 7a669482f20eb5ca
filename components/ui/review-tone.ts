import type { FindingLevel } from '@/lib/chemistry/carbonation';
import type { BatchState } from '@/lib/schemas/batches';
import type { ReviewState } from '@/lib/schemas/reviews';

import type { Tone } from './Badge';

/** The badge tone of each review state, wherever a recipe's state is shown. */
export const STATE_TONE: Record<ReviewState, Tone> = {
  draft: 'neutral',
  submitted: 'caution',
  approved: 'success',
  returned: 'danger',
};

/** The tone of a finding's or a reading's level, everywhere one is shown. */
export const LEVEL_TONE: Record<FindingLevel, Tone> = { ok: 'success', caution: 'caution', danger: 'danger' };
/** A level in words, never in colour alone. */
export const LEVEL_LABEL: Record<FindingLevel, string> = { ok: 'OK', caution: 'Caution', danger: 'Danger' };

/** The badge tone of each batch state, in the list and on the batch. */
export const BATCH_STATE_TONE: Record<BatchState, Tone> = {
  'in-progress': 'info',
  'awaiting-decision': 'caution',
  released: 'success',
  held: 'danger',
  discarded: 'neutral',
};
