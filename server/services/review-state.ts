import type { ReviewState } from '@/lib/schemas/reviews';
import type { Recipe } from '@/server/models/recipe';

/** Where a recipe's newest version stands: approved and submitted come from the recipe, returned from its record. */
export function reviewState(
  recipe: Pick<Recipe, 'currentVersion' | 'submittedVersion' | 'approvedVersion'>,
  lastActionOnCurrent: string | null,
): ReviewState {
  if (recipe.approvedVersion === recipe.currentVersion) return 'approved';
  if (recipe.submittedVersion === recipe.currentVersion) return 'submitted';
  if (lastActionOnCurrent === 'returned') return 'returned';
  return 'draft';
}
