import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';

// The usual cautions of safe isolation practice; the site's own procedure, local codes and licensed practice come first.
const CAUTIONS = [
  'This record does not isolate anything. It only records what you have done.',
  'Follow the site’s safe isolation procedure.',
  'Isolate at every energy source, then lock and tag each isolation point physically.',
  'Dissipate stored energy — pressure, heat, charge, rotation — and prove the isolation before work starts.',
  'Gas work only by a competent person registered as local law requires.',
  'Local codes, manufacturer instructions and licensed practice take precedence over anything shown here.',
];

export function IsolationCautions() {
  return (
    <View testID="isolation-cautions">
      <Notice tone="caution" title="before you raise this isolation">
        <View style={{ gap: space.xs }}>
          {CAUTIONS.map((c) => <Text key={c}>{`•  ${c}`}</Text>)}
        </View>
      </Notice>
    </View>
  );
}
