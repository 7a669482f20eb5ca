import { StyleSheet, View } from 'react-native';

import { Badge, Button, type Column, FormStatus, Table, Text } from '@/components/ui';
import { type BottleFormat, useArchiveBottleFormatMutation } from '@/lib/api/bottle-formats';
import { CLOSURE_LABELS, MATERIAL_LABELS } from '@/lib/schemas/bottle-formats';
import { space } from '@/lib/theme';
import { formatPressure, formatSmallVolume, type UnitSystem } from '@/lib/units';

interface Props {
  formats: BottleFormat[];
  units: UnitSystem;
  canEdit: boolean;
  onEdit: (format: BottleFormat) => void;
}

const fromMemory = (f: BottleFormat) => /from memory|confirm with your supplier/i.test(f.pressureSource);

export function BottleFormatsTable({ formats, units, canEdit, onEdit }: Props) {
  const archive = useArchiveBottleFormatMutation();
  const columns: Column<BottleFormat>[] = [
    {
      key: 'name',
      header: 'Format',
      flex: 1.6,
      render: (f) => (
        <View>
          <Text>{f.name}</Text>
          <Text variant="small">
            {CLOSURE_LABELS[f.closure]} · {MATERIAL_LABELS[f.material]}
            {f.archived ? ' · archived' : ''}
          </Text>
        </View>
      ),
    },
    {
      key: 'liquid',
      header: 'Liquid',
      render: (f) => `${formatSmallVolume(f.liquidMl, units)}, headspace ${formatSmallVolume(f.headspaceMl, units)}`,
    },
    {
      key: 'rating',
      header: 'Rated to',
      flex: 1.4,
      render: (f) => (
        <View style={styles.rating}>
          <Text>{formatPressure(f.maxWorkingPressureBar, units)}</Text>
          {fromMemory(f) ? (
            <Badge label="Typical value: confirm with your supplier" tone="caution" />
          ) : (
            <Text variant="small">{f.pressureSource}</Text>
          )}
        </View>
      ),
    },
  ];
  if (canEdit) {
    columns.push({
      key: 'actions',
      header: 'Actions',
      render: (f) => (
        <View style={styles.actions}>
          <Button label="Edit" accessibleName={`Edit ${f.name}`} variant="secondary" onPress={() => onEdit(f)} />
          <Button
            label={f.archived ? 'Restore' : 'Archive'}
            accessibleName={`${f.archived ? 'Restore' : 'Archive'} ${f.name}`}
            variant="quiet"
            busy={archive.isPending && archive.variables?.id === f.id}
            onPress={() => archive.mutate({ id: f.id, archived: !f.archived })}
          />
        </View>
      ),
    });
  }
  return (
    <View style={styles.wrap}>
      <FormStatus error={archive.error} />
      <Table label="Bottle formats" columns={columns} rows={formats} rowKey={(f) => f.id} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  rating: { gap: space.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
