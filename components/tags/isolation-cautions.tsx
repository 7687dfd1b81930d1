import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';

// The usual cautions of safe isolation practice; the site's own procedure, local codes and licensed practice come first.
const CAUTIONS = [
  'This record does not isolate anything. It only records what you have done.',
  'Follow the site’s safe isolation procedure.',
  'Isolate at every energy source the item has — including a mains make-up feed that can re-pressurise the section, and drive capacitors that hold a charge — then put your own lock and tag on each isolation point.',
  'Dissipate stored energy — pressure, heat, charge, rotation — before work starts.',
  // OSHA 29 CFR 1910.147(d)(6); HSE HSG253 (The safe isolation of plant and equipment).
  'Prove the isolation before you touch anything: test for dead with a tester proved on a known source before and after, check the gauge reads zero, try the start controls. A wrong breaker, a back-feed or a passing valve is only found by proving. Until you record the proof, the tag and the board show “not proved”.',
  'Gas work only by a competent person registered as local law requires.',
  'Local codes, manufacturer instructions and licensed practice take precedence over anything shown here.',
];

/**
 * Overrides leave plant in a non-normal state on purpose; these cautions say what must never be overridden and
 * what a changed hot-water setpoint risks.
 */
const OVERRIDE_CAUTIONS = [
  'Never override, bypass, link out or reset a safety device to keep plant running: high-limit thermostat, pressure or low-water switch, flame safeguard (flame failure), interlock, emergency stop. Find and fix the cause.',
  'A hot-water setpoint raised above normal brings a scalding risk at outlets: warn the building, check thermostatic mixing valves, and put it back as soon as the reason is over.',
  // HSE ACOP L8 (4th edition) and HSG274 Part 2 – the limits below are given from memory: stored hot water at 60 °C or more,
  // and water returning to the calorifier at 50 °C or more (55 °C in healthcare premises).
  'A hot-water setpoint lowered below normal brings a Legionella risk: keep stored water at 60 °C or more and the return at 50 °C or more (HSE ACOP L8 / HSG274 Part 2), and tell whoever holds the site’s water risk assessment.',
  'Put the item back to its normal state, or hand the tag over, before you leave site. The tag stays on record until someone clears it.',
];

function CautionList({ items, title, testID }: { items: string[]; title: string; testID: string }) {
  return (
    <View testID={testID}>
      <Notice tone="caution" title={title}>
        <View style={{ gap: space.xs }}>
          {items.map((c) => <Text key={c}>{`•  ${c}`}</Text>)}
        </View>
      </Notice>
    </View>
  );
}

export const IsolationCautions = () => <CautionList items={CAUTIONS} title="before you raise this isolation" testID="isolation-cautions" />;
export const OverrideCautions = () => <CautionList items={OVERRIDE_CAUTIONS} title="before you leave plant overridden" testID="override-cautions" />;
