import type { ReactNode } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { breakpoints, colors, radius, space } from '@/lib/theme';

import { Text } from './Text';

export interface Column<Row> {
  key: string;
  header: string;
  render: (row: Row) => ReactNode;
  /** Relative width on wide screens. */
  flex?: number;
}

interface Props<Row> {
  columns: Column<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string | number;
  label: string;
}

const cell = (content: ReactNode) =>
  typeof content === 'string' || typeof content === 'number' ? <Text>{content}</Text> : content;

/** A table on wide windows; on phones each row becomes a small card of "header: value" lines. */
export function Table<Row>({ columns, rows, rowKey, label }: Props<Row>) {
  const { width } = useWindowDimensions();
  if (width < breakpoints.table) {
    return (
      <View role="list" aria-label={label} style={styles.list}>
        {rows.map((row) => (
          <View role="listitem" key={rowKey(row)} style={styles.card}>
            {columns.map((column) => (
              <View key={column.key} style={styles.cardLine}>
                <Text variant="small" style={styles.cardHeader}>
                  {column.header}
                </Text>
                <View style={styles.cardValue}>{cell(column.render(row))}</View>
              </View>
            ))}
          </View>
        ))}
      </View>
    );
  }
  return (
    <View role="table" aria-label={label} style={styles.table}>
      <View role="row" style={[styles.row, styles.headRow]}>
        {columns.map((column) => (
          <View role="columnheader" key={column.key} style={[styles.cell, { flex: column.flex ?? 1 }]}>
            <Text variant="label">{column.header}</Text>
          </View>
        ))}
      </View>
      {rows.map((row) => (
        <View role="row" key={rowKey(row)} style={styles.row}>
          {columns.map((column) => (
            <View role="cell" key={column.key} style={[styles.cell, { flex: column.flex ?? 1 }]}>
              {cell(column.render(row))}
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: colors.hairline, borderRadius: radius.md, overflow: 'hidden' },
  row: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.divider, alignItems: 'center' },
  headRow: { backgroundColor: colors.surfaceMuted, borderTopWidth: 0 },
  cell: { paddingHorizontal: space.md, paddingVertical: space.sm, minHeight: 48, justifyContent: 'center' },
  list: { gap: space.sm },
  card: {
    borderWidth: 1,
    borderColor: colors.hairline,
    borderRadius: radius.md,
    padding: space.md,
    gap: space.xs,
    backgroundColor: colors.surface,
  },
  cardLine: { flexDirection: 'row', gap: space.sm, alignItems: 'center', flexWrap: 'wrap' },
  cardHeader: { width: 96 },
  cardValue: { flex: 1, minWidth: 160 },
});
