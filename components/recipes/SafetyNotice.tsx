import { Banner, Text } from '@/components/ui';
import type { RecipeCard } from '@/lib/recipes/card';

const TITLES = { ok: 'Safety: OK', caution: 'Safety: caution', danger: 'Safety: DANGER' } as const;

/**
 * What the floor must see before a batch: the worst finding, the bottle's rating against the worst-case pressure,
 * and, when an owner approved over a danger finding, that fact with the reason and the approval comment.
 */
export function SafetyNotice({ card }: { card: RecipeCard }) {
  const { safety, approval } = card;
  return (
    <Banner tone={safety.level === 'ok' ? 'success' : safety.level} title={TITLES[safety.level]}>
      <Text>{safety.headline}</Text>
      <Text>{safety.rating}</Text>
      {approval?.overrideReason ? (
        <Text>{`Approved over a danger finding. Reason: ${approval.overrideReason}`}</Text>
      ) : null}
      {approval?.comment ? <Text>{`Approval comment: ${approval.comment}`}</Text> : null}
    </Banner>
  );
}
