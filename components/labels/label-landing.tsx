import { Link, useRouter } from 'expo-router';
import { useEffect } from 'react';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { RequestError, errorMessage } from '@/hooks/api/request';
import { useLabelQuery } from '@/hooks/api/use-labels';

/** Resolves a label code to its item and replaces the address with the item's record. */
export function LabelLanding({ code }: { code: string }) {
  const router = useRouter();
  const label = useLabelQuery(code);
  useEffect(() => {
    if (label.data) router.replace(`/assets/${label.data.id}`);
  }, [label.data, router]);

  if (label.isPending || label.data) return <LoadingView />;
  const missing = label.error instanceof RequestError && label.error.status === 404;
  return (
    <Screen title={missing ? 'No such label' : 'Cannot open this label'}>
      {missing ? (
        <Notice tone="info" word="Not found" title={`No plant item has the label ${code.toUpperCase()}`}>
          The code may be mistyped, the label may have been replaced by a newer one, or it may belong to another organisation. Check the code printed under the QR, or find the item in the register.
        </Notice>
      ) : (
        <Notice tone="danger">{errorMessage(label.error)}</Notice>
      )}
      <Link href={'/scan'}><Text bold>Scan another label</Text></Link>
      <Link href={'/assets'}><Text bold>Search the register</Text></Link>
    </Screen>
  );
}
