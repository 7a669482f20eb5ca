import { Badge } from './Badge';
import { LEVEL_TONE } from './review-tone';

const LABELS = { ok: 'Safety ok', caution: 'Safety caution', danger: 'Safety danger' } as const;

/** A recipe's worst finding, in words (never in colour alone), wherever recipes are listed. */
export function SafetyBadge({ level }: { level: keyof typeof LABELS | undefined }) {
  if (!level) return null;
  return <Badge label={LABELS[level]} tone={LEVEL_TONE[level]} />;
}
