import { Badge } from '@/components/ui/badge';
import { formatDate, todayIso } from '@/components/register/register-vocabulary';
import type { Asset } from '@/shared/types/register';

// Our own planning window: a service falling due within four weeks shows as "due soon".
const DUE_SOON_DAYS = 28;

function addDays(iso: string, days: number) {
  const d = new Date(`${iso}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/** Service state with an icon and words, never a safety colour (red and yellow mean danger and caution); the server decides "overdue", the client only adds "due soon". */
export function ServiceBadge({ asset, compact }: { asset: Pick<Asset, 'nextServiceDue' | 'serviceOverdue'>; compact?: boolean }) {
  const due = asset.nextServiceDue;
  if (asset.serviceOverdue) return <Badge tone="neutral" icon="calendar-alert" label={compact ? 'Service overdue' : `Service overdue since ${formatDate(due)}`} testID="service-overdue" />;
  if (!due) return <Badge tone="neutral" icon="calendar-question" label={compact ? 'No schedule' : 'No service schedule'} />;
  if (due <= addDays(todayIso(), DUE_SOON_DAYS)) return <Badge tone="neutral" icon="calendar-clock" label={compact ? 'Service due soon' : `Service due ${formatDate(due)}`} />;
  return <Badge tone="neutral" icon="calendar-check" label={compact ? 'In date' : `Next service ${formatDate(due)}`} />;
}
