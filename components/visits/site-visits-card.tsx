import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Chip } from '@/components/ui/chip';
import { Text } from '@/components/ui/text';
import { VisitList } from '@/components/visits/visit-list';
import { useSiteVisitsQuery, type VisitFilters } from '@/hooks/api/use-visits';
import { usePermissions } from '@/hooks/auth/use-permissions';

/** A site's visits: supervisors see everyone's and may narrow to those on site now; an engineer sees their own. */
export function SiteVisitsCard({ siteId, now }: { siteId: number; now: Date }) {
  const perms = usePermissions();
  const supervising = perms.may('superviseVisits');
  const [filters, setFilters] = useState<VisitFilters>({});
  const visits = useSiteVisitsQuery(siteId, filters, perms.may('recordVisits'));
  if (!perms.may('recordVisits')) return null;
  return (
    <Card>
      <View testID="site-visits" style={{ gap: space.sm }}>
        <Text variant="title">{supervising ? 'Visits to this site' : 'Your visits to this site'}</Text>
        {supervising ? (
          <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
            <Chip label="All visits" selected={!filters.open} onPress={() => setFilters({})} testID="visits-filter-all" />
            <Chip label="On site now" selected={filters.open === 'true'} onPress={() => setFilters({ open: 'true' })} testID="visits-filter-open" />
            <Chip label="Ended" selected={filters.open === 'false'} onPress={() => setFilters({ open: 'false' })} testID="visits-filter-ended" />
          </View>
        ) : null}
        {visits.data ? <VisitList visits={visits.data.items} now={now} /> : <Text muted>Loading visits…</Text>}
      </View>
    </Card>
  );
}
