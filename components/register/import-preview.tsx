import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { DataTable } from '@/components/ui/data-table';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import type { ConnectionImportResult } from '@/shared/types/connections';
import type { ImportResult, ImportRowError } from '@/shared/types/register';

function Count({ label, value, testID }: { label: string; value: number; testID: string }) {
  return (
    <View style={styles.count} testID={testID}>
      <Text variant="heading">{String(value)}</Text>
      <Text variant="small" muted>{label}</Text>
    </View>
  );
}

/**
 * What an import would do (dry run) or did: counts, and every row the server refused with its reason. A register
 * import adds and updates items; a connections import only adds links, and says how many were already recorded.
 */
export function ImportPreview({ result, testID = 'import' }: { result: ImportResult | ConnectionImportResult; testID?: string }) {
  const bad = result.errors.length;
  const updates = 'updated' in result;
  return (
    <View style={{ gap: space.md }}>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
        <Count label="rows read" value={result.rows} testID={`${testID}-rows`} />
        <Count label={result.dryRun ? 'would be added' : 'added'} value={result.created} testID={`${testID}-created`} />
        {updates ? (
          <Count label={result.dryRun ? 'would be updated' : 'updated'} value={result.updated} testID={`${testID}-updated`} />
        ) : (
          <Count label="already recorded" value={result.unchanged} testID={`${testID}-unchanged`} />
        )}
        <Count label="problems" value={bad} testID={`${testID}-errors`} />
      </View>
      {bad ? (
        <>
          <Notice tone="danger" word="Not importable">{`${bad} ${bad === 1 ? 'problem' : 'problems'} found. Nothing has been imported. Fix the file and choose it again.`}</Notice>
          <DataTable<ImportRowError>
            label="Problems in the file"
            columns={[
              { key: 'row', title: 'Row', width: 80, render: (e) => String(e.row) },
              { key: 'column', title: 'Column', width: 200, render: (e) => e.column || '—' },
              { key: 'message', title: 'Problem', flex: 1, render: (e) => e.message },
            ]}
            rows={result.errors}
            rowKey={(e) => `${e.row}-${e.column}-${e.message}`}
            testID={`${testID}-error-table`}
          />
        </>
      ) : result.dryRun ? (
        <Notice tone="safe" word="Ready">{`No problems found in ${result.rows} ${result.rows === 1 ? 'row' : 'rows'}. Nothing has changed yet.`}</Notice>
      ) : (
        <Notice tone="safe" word="Imported">{updates ? `${result.created} added and ${result.updated} updated.` : `${result.created} added; ${result.unchanged} already recorded.`}</Notice>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  count: { flexBasis: 140, flexGrow: 1, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
});
