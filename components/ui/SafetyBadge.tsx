import { Badge } from './Badge';

const LABELS = { ok: 'Safety ok', caution: 'Safety caution', danger: 'Safety danger' } as const;
const TONES = { ok: 'success', caution: 'caution', danger: 'danger' } as const;

/** A recipe's worst finding, in words (never in colour alone), wherever recipes are listed. */
export function SafetyBadge({ level }: { level: keyof typeof LABELS | undefined }) {
  if (!level) return null;
  return <Badge label={LABELS[level]} tone={TONES[level]} />;
}
