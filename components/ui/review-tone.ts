import type { ReviewState } from '@/lib/schemas/reviews';

import type { Tone } from './Badge';

/** The badge tone of each review state, wherever a recipe's state is shown. */
export const STATE_TONE: Record<ReviewState, Tone> = {
  draft: 'neutral',
  submitted: 'caution',
  approved: 'success',
  returned: 'danger',
};
