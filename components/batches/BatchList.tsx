import { Link } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Badge, Card, type Column, EmptyState, Loading, Segmented, Table, Text, TextField } from '@/components/ui';
import { BATCH_STATE_TONE } from '@/components/ui/review-tone';
import { type BatchSummary, useBatchesQuery, useTraceQuery } from '@/lib/api/batches';
import { formatDate } from '@/lib/format';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { BATCH_STATE_LABELS, type BatchState } from '@/lib/schemas/batches';
import { colors, fonts, fontSize, space } from '@/lib/theme';

const columns: Column<BatchSummary>[] = [
  {
    key: 'lot',
    header: 'Lot code',
    flex: 1.3,
    render: (b) => (
      <Link href={`/batches/${b.id}`} style={styles.link}>
        {b.lotCode}
      </Link>
    ),
  },
  { key: 'recipe', header: 'Recipe', flex: 1.5, render: (b) => `${b.recipeName} v${b.version}` },
  {
    key: 'state',
    header: 'State',
    render: (b) => (
      <View style={styles.badges}>
        <Badge label={BATCH_STATE_LABELS[b.state]} tone={BATCH_STATE_TONE[b.state]} />
        {b.trial ? <Badge label="TRIAL" tone="caution" /> : null}
      </View>
    ),
  },
  { key: 'size', header: 'Bottles', render: (b) => String(b.bottles) },
  { key: 'started', header: 'Started', render: (b) => `${formatDate(b.startedAt)} · ${b.startedBy ?? 'someone'}` },
];

/** The brewery's batches by state and lot code, and a trace search by a supplier's lot. */
export function BatchList() {
  const [state, setState] = useState<BatchState | 'all'>('all');
  const [lot, setLot] = useState('');
  const [supplierLot, setSupplierLot] = useState('');
  const batches = useBatchesQuery({ state, lot: useDebouncedValue(lot, 250), pageSize: 50 });
  const trace = useTraceQuery(useDebouncedValue(supplierLot, 300));
  return (
    <View style={styles.wrap}>
      <Card>
        <Segmented
          label="Show"
          value={state}
          onChange={setState}
          options={[
            { value: 'all', label: 'All' },
            { value: 'in-progress', label: 'In progress' },
            { value: 'awaiting-decision', label: 'Waiting' },
            { value: 'held', label: 'Held' },
            { value: 'released', label: 'Released' },
          ]}
        />
        <TextField label="Find a lot code" value={lot} onChangeText={setLot} autoCapitalize="characters" />
      </Card>
      {batches.data ? (
        batches.data.items.length === 0 ? (
          <EmptyState
            title="No batches here"
            message="Start one from an approved recipe's batch view (Recipes → the recipe → Batch)."
          />
        ) : (
          <Table label="Batches" columns={columns} rows={batches.data.items} rowKey={(b) => String(b.id)} />
        )
      ) : (
        <Loading />
      )}
      <Card title="Trace a supplier's lot">
        <TextField
          label="Supplier's lot code"
          value={supplierLot}
          onChangeText={setSupplierLot}
          autoCapitalize="characters"
        />
        {trace.data ? (
          trace.data.length === 0 ? (
            <Text variant="muted">No batch used this lot.</Text>
          ) : (
            trace.data.map((hit) => (
              <Text key={hit.lot.id}>
                <Link href={`/batches/${hit.batch.id}`} style={styles.link}>
                  {hit.batch.lotCode}
                </Link>
                {` · ${hit.batch.recipeName} v${hit.batch.version} · ${hit.lot.ingredientName}, ${hit.lot.quantity} · ${BATCH_STATE_LABELS[hit.batch.state]}`}
              </Text>
            ))
          )
        ) : null}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  link: { color: colors.primary, fontFamily: fonts.semibold, fontSize: fontSize.md, textDecorationLine: 'underline' },
});
