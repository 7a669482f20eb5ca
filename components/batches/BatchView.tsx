import { Linking, StyleSheet, View } from 'react-native';

import { Badge, Banner, Button, Card, FormStatus, Text } from '@/components/ui';
import { PressureChart } from '@/components/ui/calculations/PressureChart';
import { BATCH_STATE_TONE, LEVEL_LABEL, LEVEL_TONE } from '@/components/ui/review-tone';
import { type BatchDetail, batchRecordUrl, useSignOffStepMutation } from '@/lib/api/batches';
import { predictedGaugeBar } from '@/lib/batches/checks';
import { env } from '@/lib/env';
import { formatDateTime } from '@/lib/format';
import { can, type Role } from '@/lib/roles';
import { BATCH_STATE_LABELS, READING_KIND_LABELS, READING_UNITS, STAGE_LABELS } from '@/lib/schemas/batches';
import { colors, fonts, fontSize, space } from '@/lib/theme';

import { PhChart } from './PhChart';
import { ReadingForm } from './ReadingForm';
import { DecisionForm, DeviationForm, IngredientLotForm } from './RecordForms';
import { stageFromNextStep } from './stage';

const when = formatDateTime;

/** The floor screen of one batch: amounts large, the steps as a checklist, readings checked as they go in, the record. */
export function BatchView({ batch, role }: { batch: BatchDetail; role: Role }) {
  const runs =
    can(role, batch.trial ? 'batches.trial' : 'batches.run') &&
    batch.state !== 'released' &&
    batch.state !== 'discarded';
  const decides = can(role, 'batches.decide') && batch.state !== 'released' && batch.state !== 'discarded';
  const signOff = useSignOffStepMutation(batch.id);
  const pressures = batch.readings.filter((r) => r.kind === 'gauge-pressure' && r.tempC !== null);
  const curve = [0, 5, 10, 15, 20, 25, 30, 35, 40].map((tempC) => ({
    tempC,
    gaugeBar: predictedGaugeBar(batch.facts, tempC),
  }));
  const timeline = [
    ...batch.readings.map((r) => ({
      at: r.takenAt,
      key: `r${r.id}`,
      level: r.check.level,
      text: `#${r.id} ${READING_KIND_LABELS[r.kind]} ${r.value}${READING_UNITS[r.kind] ? ` ${READING_UNITS[r.kind]}` : ''}${r.tempC !== null ? ` at ${r.tempC} °C` : ''} · ${STAGE_LABELS[r.stage]} · ${r.by ?? 'someone'}${r.reports.length ? ' · lab report kept' : ''}${r.correctsId ? ` · corrects #${r.correctsId}` : ''}`,
      detail: r.check.message,
    })),
    ...batch.steps
      .filter((s) => s.signedOff)
      .map((s) => ({
        at: s.signedOff!.at,
        key: `s${s.number}`,
        level: null,
        text: `Step ${s.number} signed off · ${s.signedOff!.by ?? 'someone'}`,
        detail: s.signedOff!.note,
      })),
    ...batch.ingredientLots.map((l) => ({
      at: l.at,
      key: `l${l.id}`,
      level: null,
      text: `Lot ${l.supplierLot}: ${l.ingredientName}, ${l.quantity}${l.supplier ? ` from ${l.supplier}` : ''} · ${l.by ?? 'someone'}`,
      detail: '',
    })),
    ...batch.deviations.map((d) => ({
      at: d.at,
      key: `d${d.id}`,
      level: 'caution' as const,
      text: `Deviation · ${d.by ?? 'someone'}${d.closesReadingId ? ` · answers reading #${d.closesReadingId}` : ''}`,
      detail: `${d.whatHappened} Done: ${d.actionTaken}`,
    })),
    ...batch.decisions.map((d) => ({
      at: d.at,
      key: `c${d.id}`,
      level: null,
      text: `${BATCH_STATE_LABELS[d.decision]} · ${d.by ?? 'someone'}`,
      detail: [d.note, d.overrideReason ? `Released over a danger reading: ${d.overrideReason}` : '']
        .filter(Boolean)
        .join(' '),
    })),
  ].sort((a, b) => b.at.localeCompare(a.at));

  return (
    <View style={styles.wrap}>
      <View style={styles.badges}>
        <Badge label={BATCH_STATE_LABELS[batch.state]} tone={BATCH_STATE_TONE[batch.state]} />
        {batch.trial ? <Badge label="TRIAL: not for sale" tone="caution" /> : null}
        <Text variant="small">
          {batch.recipeName}, version {batch.version} · {batch.card.batch}
        </Text>
      </View>
      {batch.standingDangers.length > 0 ? (
        <Banner tone="danger" title="Danger reading on this batch">
          {batch.readings
            .filter((r) => batch.standingDangers.includes(r.id))
            .map((r) => r.check.message)
            .join(' ')}
        </Banner>
      ) : null}
      <Banner tone={LEVEL_TONE[batch.card.safety.level]} title={`Recipe safety: ${batch.card.safety.level}`}>
        {`${batch.card.safety.headline} ${batch.card.safety.rating}`}
      </Banner>

      <Card title="Amounts">
        {batch.card.amounts.map((a) => (
          <View key={a.name} style={styles.amount}>
            <Text style={styles.amountValue}>{a.amount}</Text>
            <View style={styles.amountText}>
              <Text style={styles.amountName}>{a.name}</Text>
              {a.perBottle ? <Text variant="small">{a.perBottle} into each bottle</Text> : null}
              {a.roundingNote ? <Text variant="small">{a.roundingNote}</Text> : null}
            </View>
          </View>
        ))}
      </Card>

      <Card title="Steps">
        <FormStatus error={signOff.error} />
        {batch.steps.map((s) => (
          <View key={s.number} style={styles.step}>
            <Text style={styles.stepText}>
              {s.signedOff ? '✓ ' : ''}
              {s.number}. {s.text}
            </Text>
            {s.signedOff ? (
              <Text variant="small">
                Signed off by {s.signedOff.by ?? 'someone'}, {when(s.signedOff.at)}
              </Text>
            ) : runs ? (
              <Button
                label={`Sign off step ${s.number}`}
                variant="secondary"
                busy={signOff.isPending && signOff.variables?.step === s.number}
                onPress={() => signOff.mutate({ step: s.number, note: '' })}
                style={styles.left}
              />
            ) : null}
          </View>
        ))}
      </Card>

      {runs ? (
        <ReadingForm batchId={batch.id} stage={stageFromNextStep(batch.steps)} readings={batch.readings} />
      ) : null}

      <Card title="Readings against their limits">
        {batch.readings.some((r) => r.kind === 'ph') ? (
          <PhChart
            points={batch.readings
              .filter((r) => r.kind === 'ph')
              .map((r) => ({ at: r.takenAt, ph: r.value, level: r.check.level }))}
          />
        ) : (
          <Text variant="muted">
            No pH reading yet: pH is the key control point. Record the base before flavouring.
          </Text>
        )}
        {pressures.length > 0 ? (
          <>
            <Text variant="small">
              Test bottles (dots) against the recipe&apos;s worst case for this batch&apos;s sugar and the bottle&apos;s
              rating.
            </Text>
            <PressureChart
              worst={curve}
              expected={[]}
              ratingBar={batch.facts.ratingBar}
              units="metric"
              marks={pressures.map((r) => ({ tempC: r.tempC!, gaugeBar: r.value, level: r.check.level }))}
            />
          </>
        ) : null}
      </Card>

      {runs ? <IngredientLotForm batchId={batch.id} /> : null}
      {runs ? <DeviationForm batch={batch} /> : null}
      {decides ? <DecisionForm batch={batch} /> : null}

      <Card
        title="Record"
        aside={
          <Button
            label="Record PDF"
            variant="quiet"
            onPress={() => Linking.openURL(`${env.apiUrl}${batchRecordUrl(batch.id)}`)}
          />
        }
      >
        {timeline.length === 0 ? <Text variant="muted">Nothing recorded yet.</Text> : null}
        {timeline.map((e) => (
          <View key={e.key} style={styles.entry}>
            <View style={styles.badges}>
              {e.level ? <Badge label={LEVEL_LABEL[e.level]} tone={LEVEL_TONE[e.level]} /> : null}
              <Text>{e.text}</Text>
            </View>
            <Text variant="small">
              {when(e.at)}
              {e.detail ? ` · ${e.detail}` : ''}
            </Text>
          </View>
        ))}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  amount: { flexDirection: 'row', alignItems: 'baseline', gap: space.md, paddingVertical: space.xs },
  amountValue: { fontFamily: fonts.bold, fontSize: fontSize.display, minWidth: 120 },
  amountText: { flex: 1, flexShrink: 1 },
  amountName: { fontSize: fontSize.lg },
  step: { gap: space.xs, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.divider },
  stepText: { fontSize: fontSize.lg },
  entry: { gap: space.xxs, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.divider },
  left: { alignSelf: 'flex-start' },
});
