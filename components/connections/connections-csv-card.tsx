import { CsvExportCard } from '@/components/register/csv-export-card';
import { CsvImportCard } from '@/components/register/csv-import-card';
import { todayIso } from '@/components/register/register-vocabulary';
import { useExportConnectionsMutation, useImportConnectionsMutation } from '@/hooks/api/use-connections';

/** Plant connections (which item feeds which) as CSV: export every site's, import links from a file. */
export function ConnectionsCsvCard() {
  const exporter = useExportConnectionsMutation();
  const importer = useImportConnectionsMutation();
  return (
    <>
      <CsvExportCard
        title="Export plant connections"
        intro="Every recorded link between plant items, one row each: site, from (plant ID), to (plant ID), medium."
        run={() => exporter.mutateAsync(null)}
        fileName={`isoledger-connections-${todayIso()}.csv`}
        testID="connections-export-csv"
      />
      <CsvImportCard
        title="Import plant connections"
        intro="Columns: site, from, to, medium. Rows only ever add links; a link already recorded is left as it is. The file is checked first and nothing changes until you press Import."
        importer={importer}
        testID="connections-import"
      />
    </>
  );
}
