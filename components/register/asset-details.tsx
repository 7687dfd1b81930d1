import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { DetailList } from '@/components/register/detail-list';
import { EnergyChips } from '@/components/register/energy-chips';
import { ATTRIBUTE_META, formatDate, optionLabel } from '@/components/register/register-vocabulary';
import { ServiceBadge } from '@/components/register/service-badge';
import { attributeFields } from '@/components/register/attribute-fields';
import { ASSET_TYPE_LABELS } from '@/shared/rules/register';
import type { Asset } from '@/shared/types/register';

function attributeRows(a: Asset): [string, string | null][] {
  return attributeFields(a.type).map((f) => {
    const meta = ATTRIBUTE_META[f.key] ?? { label: f.key };
    const raw = a.attributes[f.key];
    const shown = raw === null || raw === undefined || raw === '' ? null : f.kind === 'choice' ? optionLabel(String(raw)) : `${raw}${meta.unit ? ` ${meta.unit}` : ''}`;
    return [meta.label, shown];
  });
}

/** The item's record, grouped the way an engineer reads it: what it is, its service, its energy, its type's figures. */
export function AssetDetails({ asset: a }: { asset: Asset }) {
  const { isWide } = useBreakpoints();
  const attrs = attributeRows(a);
  return (
    <View style={{ gap: space.lg, flexDirection: isWide ? 'row' : 'column', flexWrap: 'wrap' }}>
      <Card style={isWide ? { flexBasis: 520, flexGrow: 2 } : undefined}>
        <Text variant="title">Identity</Text>
        <DetailList
          twoColumns
          rows={[
            ['Plant ID', a.plantId],
            ['Label code', a.labelCode],
            ['Type', ASSET_TYPE_LABELS[a.type]],
            ['System', a.system],
            ['Manufacturer', a.manufacturer],
            ['Model', a.model],
            ['Serial number', a.serialNumber],
            ['Installed', a.installDate ? formatDate(a.installDate) : null],
          ]}
        />
      </Card>
      <View style={{ gap: space.lg, flexBasis: isWide ? 320 : undefined, flexGrow: 1 }}>
        <Card>
          <Text variant="title">Service</Text>
          <ServiceBadge asset={a} />
          <DetailList
            rows={[
              ['Interval', a.serviceIntervalMonths ? `Every ${a.serviceIntervalMonths} months` : null],
              ['Last service', a.lastServiceDate ? formatDate(a.lastServiceDate) : null],
              ['Next due', a.nextServiceDue ? formatDate(a.nextServiceDue) : null],
            ]}
          />
        </Card>
        <Card>
          <Text variant="title">Energy sources</Text>
          <EnergyChips sources={a.energySources} />
        </Card>
      </View>
      {attrs.length ? (
        <Card style={isWide ? { flexBasis: 520, flexGrow: 2 } : undefined}>
          <Text variant="title">{`${ASSET_TYPE_LABELS[a.type]} details`}</Text>
          <DetailList twoColumns rows={attrs} />
        </Card>
      ) : null}
      {a.notes?.trim() ? (
        <Card style={isWide ? { flexBasis: 320, flexGrow: 1 } : undefined}>
          <Text variant="title">Notes</Text>
          <Text>{a.notes}</Text>
        </Card>
      ) : null}
    </View>
  );
}
