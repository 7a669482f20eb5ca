import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { formatDate } from '@/lib/format';
import type { RecipeCard } from '@/lib/recipes/card';
import { colors, fonts, fontSize, space } from '@/lib/theme';

const SAFETY_WORDS = { ok: 'OK', caution: 'CAUTION', danger: 'DANGER' } as const;
/** A write-in box a pen fits in: 40 CSS px, printed at the card's 80 % (print.css) 32 px, 8.5 mm (at least 8 mm). */
export const WRITE_IN_HEIGHT = 40;

/**
 * The card on screen and on paper: large amounts with each bottle's share, numbered steps, and checkpoints with
 * their targets beside boxes to write in. Two columns when the page is wide enough (A4 or Letter), one on a phone.
 */
export function RecipeCardView({ card }: { card: RecipeCard }) {
  return (
    <View style={styles.card} dataSet={{ printCard: 'yes' }}>
      <View style={styles.head}>
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
      </View>
      <View
        style={[styles.safety, card.safety.level !== 'ok' && styles.safetyAlert]}
        role={card.safety.level === 'danger' ? 'alert' : undefined}
      >
        <Text style={styles.bold}>Safety: {SAFETY_WORDS[card.safety.level]}</Text>
        <Text>{card.safety.headline}</Text>
        <Text>{card.safety.rating}</Text>
        {card.approval?.overrideReason ? (
          <Text style={styles.bold}>Approved over a danger finding. Reason: {card.approval.overrideReason}</Text>
        ) : null}
        {card.approval?.comment ? <Text>Approval comment: {card.approval.comment}</Text> : null}
      </View>
      <Text>
        <Text style={styles.bold}>Batch:</Text> {card.batch}. <Text style={styles.bold}>Base:</Text> {card.base}.
      </Text>
      <View style={styles.columns}>
        <View style={styles.column}>
          <Section title="Amounts">
            {card.amounts.map((a) => (
              <View key={a.name} style={styles.amount} testID="card-amount">
                <Text style={styles.amountValue}>{a.amount}</Text>
                <View style={styles.amountText}>
                  <Text style={styles.amountName}>{a.name}</Text>
                  {a.perBottle ? <Text variant="small">{a.perBottle} into each bottle</Text> : null}
                  {a.roundingNote ? <Text style={styles.note}>{a.roundingNote}</Text> : null}
                </View>
              </View>
            ))}
          </Section>
          <Section title="Checkpoints">
            {card.checkpoints.map((c) => (
              <View key={c.label} style={styles.checkpoint} testID="card-checkpoint">
                <View style={styles.checkpointText}>
                  <Text style={styles.checkpointLabel}>{c.label}</Text>
                  {c.target ? <Text variant="small">{c.target}</Text> : null}
                </View>
                <View style={styles.box} aria-label={`Write in: ${c.label}`} testID="write-in" />
              </View>
            ))}
          </Section>
        </View>
        <View style={styles.column}>
          <Section title="Steps">
            {card.steps.map((s, i) => (
              <Text key={i}>
                <Text style={styles.bold}>{i + 1}.</Text> {s}
              </Text>
            ))}
          </Section>
          <Section title="Key numbers">
            {card.keyNumbers.map((k) => (
              <Text key={k.label}>
                <Text style={styles.bold}>{k.label}:</Text> {k.value}
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
        </View>
      </View>
      <View style={styles.cautions}>
        {card.cautions.map((c) => (
          <Text key={c} variant="small">
            • {c}
          </Text>
        ))}
      </View>
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
  safety: { borderWidth: 1, borderColor: colors.text, padding: space.sm, gap: space.xxs },
  safetyAlert: { borderWidth: 3 },
  bold: { fontFamily: fonts.bold },
  card: {
    backgroundColor: colors.surface,
    padding: space.lg,
    gap: space.sm,
    borderRadius: 12,
    borderWidth: 1,
    borderColor: colors.hairline,
  },
  head: { gap: space.xxs },
  notApproved: { fontFamily: fonts.bold, color: colors.danger, fontSize: fontSize.lg },
  // Two columns once each can be 300 px wide (A4 and Letter both are), one on a phone.
  columns: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.sm },
  column: { flexGrow: 1, flexShrink: 1, flexBasis: 300, gap: space.sm },
  section: { gap: space.xs },
  // The name wraps beside its own amount, never under the next one.
  amount: { flexDirection: 'row', alignItems: 'baseline', gap: space.sm },
  amountValue: { fontFamily: fonts.bold, fontSize: fontSize.xl, lineHeight: 28, minWidth: 96 },
  amountText: { flex: 1, flexShrink: 1 },
  amountName: { fontSize: fontSize.md, lineHeight: 22 },
  note: { fontSize: fontSize.xs, fontFamily: fonts.bold },
  checkpoint: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  checkpointText: { flex: 1, flexShrink: 1 },
  checkpointLabel: { fontFamily: fonts.bold },
  box: {
    width: 120,
    height: WRITE_IN_HEIGHT,
    borderWidth: 1.5,
    borderColor: colors.text,
    borderRadius: 4,
    backgroundColor: colors.surface,
  },
  cautions: { gap: space.xxs, borderTopWidth: 1, borderTopColor: colors.hairline, paddingTop: space.sm },
});
