import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useState } from 'react';
import { ActivityIndicator, View } from 'react-native';
import { colors, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { clockTime } from '@/components/board/board-vocabulary';
import { canPrint, printBoard } from '@/components/board/print-styles';
import { saveFile } from '@/components/ui/save-file';
import { errorMessage } from '@/hooks/api/request';
import { fetchBoardCsv } from '@/hooks/api/use-board';
import { localDate } from '@/shared/rules/time-zone';
import type { BoardQuery } from '@/shared/types/board';

interface Props {
  query: BoardQuery;
  /** When the data shown was computed (the response's asOf) or fetched. */
  updatedAt: string | number | null;
  fetching: boolean;
  onRefresh: () => void;
}

/** "Updated hh:mm:ss", CSV export of the current view and printing. */
export function BoardActions({ query, updatedAt, fetching, onRefresh }: Props) {
  const { isWide } = useBreakpoints();
  const [exporting, setExporting] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const exportCsv = async () => {
    setExporting(true);
    setProblem(null);
    try {
      saveFile(await fetchBoardCsv(query), `isoledger-board-${localDate(new Date(), 'UTC')}.csv`);
    } catch (err) {
      setProblem(errorMessage(err));
    } finally {
      setExporting(false);
    }
  };
  return (
    <View style={{ gap: space.xs, alignItems: isWide ? 'flex-end' : 'flex-start', flexShrink: 1 }}>
      <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.xs }} accessibilityLiveRegion="polite">
        {fetching ? <ActivityIndicator color={colors.brand} accessibilityLabel="Refreshing" /> : <MaterialCommunityIcons name="update" size={18} color={colors.inkMuted} />}
        <Text variant="small" muted testID="board-updated">{updatedAt ? `Updated ${clockTime(updatedAt)}` : 'Loading…'}</Text>
      </View>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: isWide ? 'flex-end' : 'flex-start' }} nativeID="board-actions">
        <Button title="Refresh" variant="quiet" onPress={onRefresh} testID="board-refresh" />
        <Button title="Export CSV" variant="secondary" busy={exporting} onPress={() => void exportCsv()} testID="board-export" />
        {canPrint ? <Button title="Print" variant="secondary" onPress={printBoard} testID="board-print" /> : null}
      </View>
      {problem ? <Text variant="small" style={{ color: colors.danger }}>⚠ {problem}</Text> : null}
    </View>
  );
}
