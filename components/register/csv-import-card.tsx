import type { UseMutationResult } from '@tanstack/react-query';
import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { FilePicker, filePickerAvailable } from '@/components/register/file-picker';
import { ImportPreview } from '@/components/register/import-preview';
import { errorMessage } from '@/hooks/api/request';
import type { ConnectionImportResult } from '@/shared/types/connections';
import type { ImportResult } from '@/shared/types/register';

type Importer<R> = UseMutationResult<R, Error, { file: Blob; dryRun: boolean }>;

/**
 * A CSV import in two steps: choosing a file checks it (dry run) and shows what would change; only the Import
 * button writes, and only when the check found no problem. `testID` prefixes every part (`import-choose`, `import-run`).
 */
export function CsvImportCard<R extends ImportResult | ConnectionImportResult>({ title, intro, importer, testID }: { title: string; intro: string; importer: Importer<R>; testID: string }) {
  const [file, setFile] = useState<File | null>(null);
  const check = (f: File) => {
    setFile(f);
    importer.mutate({ file: f, dryRun: true });
  };
  const result = importer.data;
  const canImport = !!file && result?.dryRun === true && result.errors.length === 0 && result.rows > 0;
  return (
    <Card>
      <Text variant="title">{title}</Text>
      <Text>{intro}</Text>
      <FilePicker label={file ? 'Choose another file' : 'Choose CSV file'} onFile={check} busy={importer.isPending && importer.variables?.dryRun} testID={`${testID}-choose`} />
      {file && filePickerAvailable ? <Text muted>{`File: ${file.name}`}</Text> : null}
      {importer.isError ? <Notice tone="danger" word="Not checked">{errorMessage(importer.error)}</Notice> : null}
      {result ? <ImportPreview result={result} testID={testID} /> : null}
      {canImport ? (
        <View style={{ flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' }}>
          <Button title={`Import ${result.rows} ${result.rows === 1 ? 'row' : 'rows'}`} onPress={() => importer.mutate({ file, dryRun: false })} busy={importer.isPending} testID={`${testID}-run`} />
        </View>
      ) : null}
    </Card>
  );
}
