import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { formatDate } from '@/lib/format';
import type { RecipeCard } from '@/lib/recipes/card';
import { colors, fonts, fontSize, space } from '@/lib/theme';

const SAFETY_WORDS = { ok: 'OK', caution: 'CAUTION', danger: 'DANGER' } as const;

/** The card on screen and on paper: large amounts, numbered steps, blanks to fill in by hand. */
export function RecipeCardView({ card }: { card: RecipeCard }) {
  return (
    <View style={styles.card} dataSet={{ printCard: 'yes' }}>
      <Text variant="small">{card.brewery}</Text>
      <Text variant="title" level={1}>
        {card.recipeName}, version {card.version}
      </Text>
      {card.approval ? (
        <Text>
          Approved for production by {card.approval.by ?? 'an owner'} on {formatDate(card.approval.at)}
          {card.approval.selfApproved ? ' (the brewery’s only owner, who also submitted it)' : ''}.
        </Text>
      ) : (
        <Text style={styles.notApproved}>NOT APPROVED FOR PRODUCTION: development version.</Text>
      )}
      <View
        style={[styles.safety, card.safety.level !== 'ok' && styles.safetyAlert]}
        role={card.safety.level === 'danger' ? 'alert' : undefined}
      >
        <Text style={styles.safetyLevel}>Safety: {SAFETY_WORDS[card.safety.level]}</Text>
        <Text>{card.safety.headline}</Text>
        <Text>{card.safety.rating}</Text>
        {card.approval?.overrideReason ? (
          <Text style={styles.safetyLevel}>Approved over a danger finding. Reason: {card.approval.overrideReason}</Text>
        ) : null}
        {card.approval?.comment ? <Text>Approval comment: {card.approval.comment}</Text> : null}
      </View>
      <Text>Batch: {card.batch}.</Text>
      <Text>Base: {card.base}.</Text>
      <Section title="Amounts">
        {card.amounts.map((a) => (
          <View key={a.name} style={styles.amount}>
            <Text style={styles.amountValue}>{a.amount}</Text>
            <Text style={styles.amountName}>{a.name}</Text>
          </View>
        ))}
      </Section>
      <Section title="Steps">
        {card.steps.map((s, i) => (
          <Text key={i}>
            {i + 1}. {s}
          </Text>
        ))}
      </Section>
      <Section title="Checkpoints">
        {card.checkpoints.map((c) => (
          <Text key={c} style={styles.checkpoint}>
            {c}
          </Text>
        ))}
      </Section>
      <Section title="Key numbers">
        {card.keyNumbers.map((k) => (
          <Text key={k.label}>
            {k.label}: {k.value}
          </Text>
        ))}
      </Section>
      <Section title="Allergens">
        <Text>
          {card.allergens.length
            ? card.allergens.join(', ')
            : 'None of the major allergens recorded for these ingredients.'}
        </Text>
      </Section>
      <Section title="Cautions">
        {card.cautions.map((c) => (
          <Text key={c} variant="small">
            • {c}
          </Text>
        ))}
      </Section>
      <Text variant="small">
        Card code {card.code}: open it in Fizzwright at /c/{card.code}
      </Text>
    </View>
  );
}

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <View style={styles.section}>
      <Text variant="subheading" level={2}>
        {title}
      </Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  // Black on white on paper too: the level is in words and weight, never in colour alone.
  safety: { borderWidth: 1, borderColor: colors.text, padding: space.sm, gap: space.xs },
  safetyAlert: { borderWidth: 3 },
  safetyLevel: { fontFamily: fonts.bold },
  card: {
    backgroundColor: colors.surface,
    padding: space.xl,
    gap: space.sm,
    borderRadius: 12,
    borderWidth: 1,
    borderColor: colors.hairline,
  },
  notApproved: { fontFamily: fonts.bold, color: colors.danger, fontSize: fontSize.lg },
  section: { gap: space.xs, paddingTop: space.md },
  // The name wraps beside its own amount, never under the next one.
  amount: { flexDirection: 'row', alignItems: 'baseline', gap: space.md },
  amountValue: { fontFamily: fonts.bold, fontSize: fontSize.display, lineHeight: 32, minWidth: 130 },
  amountName: { fontSize: fontSize.lg, lineHeight: 26, flex: 1, flexShrink: 1 },
  checkpoint: { fontSize: fontSize.lead, lineHeight: 32 },
});
