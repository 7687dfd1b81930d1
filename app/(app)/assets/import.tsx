import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Breadcrumbs } from '@/components/register/breadcrumbs';
import { ConnectionsCsvCard } from '@/components/connections/connections-csv-card';
import { CsvExportCard } from '@/components/register/csv-export-card';
import { CsvImportCard } from '@/components/register/csv-import-card';
import { todayIso } from '@/components/register/register-vocabulary';
import { useExportAssetsMutation, useImportAssetsMutation } from '@/hooks/api/use-assets';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function ImportExportScreen() {
  const perms = usePermissions();
  const exporter = useExportAssetsMutation();
  const importer = useImportAssetsMutation();

  if (!perms.canImport) {
    return (
      <Screen title="Import and export">
        <Notice tone="info" word="Not allowed">Only supervisors and administrators import or export the register.</Notice>
      </Screen>
    );
  }
  return (
    <Screen title="Import and export" subtitle="The plant register and its connections as CSV spreadsheets">
      <Breadcrumbs trail={[{ label: 'Register', href: '/assets' }]} />
      <CsvExportCard
        title="Export the register"
        intro="Every item in the register, one row each, with the columns the import reads back."
        run={() => exporter.mutateAsync()}
        fileName={`isoledger-register-${todayIso()}.csv`}
        testID="export-csv"
      />
      <CsvImportCard title="Import into the register" intro="Start from an exported file. The file is checked first and nothing changes until you press Import." importer={importer} testID="import" />
      <ConnectionsCsvCard />
    </Screen>
  );
}
