import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { saveFile } from '@/components/ui/save-file';
import { Breadcrumbs } from '@/components/register/breadcrumbs';
import { DetailList } from '@/components/register/detail-list';
import { formatInZone } from '@/components/tags/tag-time';
import { useNow } from '@/components/tags/use-now';
import { EndVisitForm } from '@/components/visits/end-visit-form';
import { VisitActivityList } from '@/components/visits/visit-activity-list';
import { errorMessage } from '@/hooks/api/request';
import { useMyTagsQuery } from '@/hooks/api/use-me';
import { useVisitQuery, useVisitReportMutation } from '@/hooks/api/use-visits';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function VisitScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const perms = usePermissions();
  const visit = useVisitQuery(id);
  const mine = visit.data?.person.id === perms.userId;
  const myTags = useMyTagsQuery(!!visit.data?.inProgress && mine);
  const report = useVisitReportMutation();
  const [ending, setEnding] = useState(false);
  const now = useNow();
  return (
    <QueryScreen query={visit} title="Visit">
      {(v) => (
        <Screen
          title={`Visit to ${v.site.name}`}
          subtitle={v.inProgress ? `In progress · ${v.person.name}` : `Ended · ${v.person.name}`}
          actions={
            <>
              {v.inProgress && mine && !ending ? <Button title="End visit" onPress={() => setEnding(true)} testID="visit-end" /> : null}
              <Button title="Report (PDF)" variant="secondary" busy={report.isPending} onPress={() => void report.mutateAsync(v.id).then((blob) => saveFile(blob, `isoledger-visit-${v.id}.pdf`))} testID="visit-report" />
            </>
          }
        >
          <Breadcrumbs trail={[{ label: 'Register', href: '/assets' }, { label: v.site.name, href: `/sites/${v.site.id}` }]} />
          {report.isError ? <Notice tone="info" word="Not downloaded">{errorMessage(report.error)}</Notice> : null}
          <Card>
            <DetailList
              twoColumns
              rows={[
                ['Engineer', v.person.name],
                ['Job reference', v.jobReference],
                ['Came for', v.purpose],
                ['Arrived', formatInZone(v.startedAt, v.site.timeZone, now)],
                ['Left', v.endedAt ? formatInZone(v.endedAt, v.site.timeZone, now) : 'Still on site'],
                ['Note on leaving', v.endNote],
              ]}
            />
          </Card>
          {ending && myTags.data ? (
            <EndVisitForm visit={v} held={myTags.data.filter((t) => t.asset.siteId === v.site.id)} onEnded={() => setEnding(false)} onCancel={() => setEnding(false)} />
          ) : null}
          <VisitActivityList visit={v} now={now} />
        </Screen>
      )}
    </QueryScreen>
  );
}
