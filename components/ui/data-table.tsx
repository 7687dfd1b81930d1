import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useState, type ReactNode } from 'react';
import { ActivityIndicator, Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';

export interface Column<T> {
  key: string;
  title: string;
  /** Fixed width in px; otherwise the column shares the rest by `flex` (default 1). */
  width?: number;
  flex?: number;
  sortable?: boolean;
  align?: 'left' | 'right';
  render: (row: T) => ReactNode;
}

export interface SortState {
  key: string;
  dir: 'asc' | 'desc';
}

export interface Paging {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
}

interface Props<T> {
  columns: Column<T>[];
  rows: T[];
  rowKey: (row: T) => string | number;
  sort?: SortState;
  onSort?: (sort: SortState) => void;
  paging?: Paging;
  onRowPress?: (row: T) => void;
  /** A fetch is under way (new page, new sort) while the previous rows stay shown. */
  busy?: boolean;
  empty?: ReactNode;
  /** Width below which the table scrolls sideways instead of squeezing its columns. */
  minWidth?: number;
  label: string;
  testID?: string;
}

/** A dense, sortable, paged table for wide screens. Cells render whatever the column returns. */
export function DataTable<T>({ columns, rows, rowKey, sort, onSort, paging, onRowPress, busy, empty, minWidth = 0, label, testID }: Props<T>) {
  const cellStyle = (c: Column<T>) => [styles.cell, c.width ? { width: c.width } : { flex: c.flex ?? 1 }, c.align === 'right' && { alignItems: 'flex-end' as const }];
  const pressSort = (c: Column<T>) => onSort?.({ key: c.key, dir: sort?.key === c.key && sort.dir === 'asc' ? 'desc' : 'asc' });
  const pages = paging ? Math.max(1, Math.ceil(paging.total / paging.pageSize)) : 1;
  // A horizontal ScrollView gives its content no width to share out, so the table takes the frame's
  // measured width (or minWidth, when the frame is narrower and the table scrolls sideways).
  const [frameWidth, setFrameWidth] = useState(0);
  const tableWidth = Math.max(frameWidth, minWidth);

  return (
    <View style={styles.frame} testID={testID} onLayout={(e) => setFrameWidth(Math.floor(e.nativeEvent.layout.width) - 2)}>
      <ScrollView horizontal>
        <View style={tableWidth ? { width: tableWidth } : { minWidth }} role="table" aria-label={label}>
          <View style={[styles.row, styles.headerRow]} role="row">
            {columns.map((c) => {
              const active = sort?.key === c.key;
              const ariaSort = active ? (sort!.dir === 'asc' ? 'ascending' : 'descending') : c.sortable ? 'none' : undefined;
              return (
                <View key={c.key} style={cellStyle(c)} role="columnheader" aria-sort={ariaSort}>
                  {c.sortable && onSort ? (
                    <Pressable onPress={() => pressSort(c)} accessibilityRole="button" accessibilityLabel={`Sort by ${c.title}`} style={styles.sortButton} testID={`sort-${c.key}`}>
                      <Text variant="label" bold>{c.title}</Text>
                      <MaterialCommunityIcons name={active ? (sort!.dir === 'asc' ? 'arrow-up' : 'arrow-down') : 'swap-vertical'} size={18} color={active ? colors.ink : colors.inkMuted} />
                    </Pressable>
                  ) : (
                    <Text variant="label" bold>{c.title}</Text>
                  )}
                </View>
              );
            })}
          </View>
          {rows.length === 0 && empty ? <View style={{ padding: space.lg }}>{empty}</View> : null}
          {rows.map((row, i) => {
            const cells = columns.map((c) => {
              const v = c.render(row);
              return (
                <View key={c.key} style={cellStyle(c)} role="cell">
                  {typeof v === 'string' || typeof v === 'number' ? <Text variant="small">{v}</Text> : v}
                </View>
              );
            });
            const style = StyleSheet.flatten([styles.row, i % 2 === 1 && styles.stripe]);
            return onRowPress ? (
              <Pressable key={rowKey(row)} role="row" onPress={() => onRowPress(row)} style={(state) => [style, (state as { hovered?: boolean }).hovered && styles.hover]}>
                {cells}
              </Pressable>
            ) : (
              <View key={rowKey(row)} role="row" style={style}>{cells}</View>
            );
          })}
        </View>
      </ScrollView>
      {paging ? (
        <View style={styles.pager}>
          <Text variant="small" muted style={{ flex: 1 }}>
            {paging.total === 0 ? 'No items' : `${(paging.page - 1) * paging.pageSize + 1}–${Math.min(paging.total, paging.page * paging.pageSize)} of ${paging.total}`}
          </Text>
          {busy ? <ActivityIndicator color={colors.brand} accessibilityLabel="Loading" /> : null}
          <Button title="Previous" variant="secondary" disabled={paging.page <= 1} onPress={() => paging.onPage(paging.page - 1)} testID="page-previous" />
          <Text variant="small" bold>{`Page ${paging.page} of ${pages}`}</Text>
          <Button title="Next" variant="secondary" disabled={paging.page >= pages} onPress={() => paging.onPage(paging.page + 1)} testID="page-next" />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'stretch', borderBottomWidth: 1, borderBottomColor: colors.line, minHeight: layout.minTouch },
  headerRow: { backgroundColor: colors.surfaceSunk, borderBottomWidth: 2, borderBottomColor: colors.ink },
  stripe: { backgroundColor: colors.paper },
  hover: { backgroundColor: colors.mandatorySoft },
  cell: { paddingHorizontal: space.sm, paddingVertical: space.xs, justifyContent: 'center', minWidth: 0 },
  sortButton: { flexDirection: 'row', alignItems: 'center', gap: space.xs, minHeight: layout.minTouch },
  pager: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
});
