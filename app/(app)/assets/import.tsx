import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { Breadcrumbs } from '@/components/register/breadcrumbs';
import { FilePicker, filePickerAvailable } from '@/components/register/file-picker';
import { ImportPreview } from '@/components/register/import-preview';
import { todayIso } from '@/components/register/register-vocabulary';
import { saveFile } from '@/components/ui/save-file';
import { errorMessage } from '@/hooks/api/request';
import { useExportAssetsMutation, useImportAssetsMutation } from '@/hooks/api/use-assets';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function ImportExportScreen() {
  const perms = usePermissions();
  const exporter = useExportAssetsMutation();
  const importer = useImportAssetsMutation();
  const [file, setFile] = useState<File | null>(null);
  const [exportNote, setExportNote] = useState<string | null>(null);

  const check = (f: File) => {
    setFile(f);
    importer.mutate({ file: f, dryRun: true });
  };
  const runExport = async () => {
    setExportNote(null);
    const blob = await exporter.mutateAsync();
    setExportNote(saveFile(blob, `isoledger-register-${todayIso()}.csv`) ? 'The CSV file has been downloaded.' : 'Exporting is available in the Isoledger web app.');
  };
  const result = importer.data;
  const canImport = !!file && result?.dryRun === true && result.errors.length === 0 && result.rows > 0;

  if (!perms.canImport) {
    return (
      <Screen title="Import and export">
        <Notice tone="info" word="Not allowed">Only supervisors and administrators import or export the register.</Notice>
      </Screen>
    );
  }
  return (
    <Screen title="Import and export" subtitle="The plant register as a CSV spreadsheet">
      <Breadcrumbs trail={[{ label: 'Register', href: '/assets' }]} />
      <Card>
        <Text variant="title">Export</Text>
        <Text>Every item in the register, one row each, with the columns the import reads back.</Text>
        {exporter.isError ? <Notice tone="danger" word="Not exported">{errorMessage(exporter.error)}</Notice> : null}
        {exportNote ? <Notice tone="safe" word="Done">{exportNote}</Notice> : null}
        <Button title="Export CSV" style={{ alignSelf: 'flex-start' }} onPress={() => void runExport().catch(() => undefined)} busy={exporter.isPending} testID="export-csv" />
      </Card>
      <Card>
        <Text variant="title">Import</Text>
        <Text>Start from an exported file. The file is checked first and nothing changes until you press Import.</Text>
        <FilePicker label={file ? 'Choose another file' : 'Choose CSV file'} onFile={check} busy={importer.isPending && importer.variables?.dryRun} testID="import-choose" />
        {file && filePickerAvailable ? <Text muted>{`File: ${file.name}`}</Text> : null}
        {importer.isError ? <Notice tone="danger" word="Not checked">{errorMessage(importer.error)}</Notice> : null}
        {result ? <ImportPreview result={result} /> : null}
        {canImport ? (
          <View style={{ flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' }}>
            <Button title={`Import ${result.rows} ${result.rows === 1 ? 'row' : 'rows'}`} onPress={() => importer.mutate({ file, dryRun: false })} busy={importer.isPending} testID="import-run" />
          </View>
        ) : null}
      </Card>
    </Screen>
  );
}
