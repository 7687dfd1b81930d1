import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { saveFile } from '@/components/ui/save-file';
import { errorMessage } from '@/hooks/api/request';

/** Downloads a CSV export (`run` fetches it with the token) and says whether the file was saved. */
export function CsvExportCard({ title, intro, run, fileName, testID }: { title: string; intro: string; run: () => Promise<Blob>; fileName: string; testID: string }) {
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<{ ok: boolean; text: string } | null>(null);
  const go = async () => {
    setOutcome(null);
    setBusy(true);
    try {
      const saved = saveFile(await run(), fileName);
      setOutcome({ ok: true, text: saved ? 'The CSV file has been downloaded.' : 'Exporting is available in the Isoledger web app.' });
    } catch (err) {
      setOutcome({ ok: false, text: errorMessage(err) });
    } finally {
      setBusy(false);
    }
  };
  return (
    <Card>
      <Text variant="title">{title}</Text>
      <Text>{intro}</Text>
      {outcome ? <Notice tone={outcome.ok ? 'safe' : 'danger'} word={outcome.ok ? 'Done' : 'Not exported'}>{outcome.text}</Notice> : null}
      <Button title="Export CSV" style={{ alignSelf: 'flex-start' }} onPress={() => void go()} busy={busy} testID={testID} />
    </Card>
  );
}
