import { StyleSheet, View } from 'react-native';
import { FormSelectField } from '@/components/forms/bound-fields';
import { FormMeasurementField } from '@/components/readings/measurement-field';
import { CHOICE_FIELD_DEFS, isChoiceKey, READING_FIELD_DEFS } from '@/components/readings/reading-fields';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { GAS_WORK_CAUTION, UNIT_OPTIONS } from '@/shared/calc';
import type { ReadingSection } from '@/shared/rules/reading-sections';

/** One section of the reading form (gas, flue gas, hot water …): its fields, bound to the form. */
export function ReadingSectionFields({ section }: { section: ReadingSection }) {
  const { isWide } = useBreakpoints();
  return (
    <View style={{ gap: space.xs }} testID={`reading-section-${section.key}`}>
      <Text variant="title">{section.title}</Text>
      {section.key === 'gas' ? <Notice tone="caution" title="Gas work">{GAS_WORK_CAUTION}</Notice> : null}
      <View style={[isWide && styles.wide]}>
        {section.fields.map((key) => {
          if (isChoiceKey(key)) {
            const def = CHOICE_FIELD_DEFS[key];
            return (
              <View key={key} style={isWide ? styles.fieldWide : styles.choice}>
                <FormSelectField
                  name={`choices.${key}`}
                  label={def.label}
                  options={Object.entries(def.options).map(([value, label]) => ({ value, label }))}
                  placeholder="Not tested"
                  clearable
                  testID={`reading-${key}`}
                />
              </View>
            );
          }
          const f = READING_FIELD_DEFS[key];
          return (
            <View key={key} style={isWide ? styles.fieldWide : undefined}>
              <FormMeasurementField label={f.label} hint={f.hint} entry={`entries.${key}`} unitField={`units.${key}`} units={UNIT_OPTIONS[f.quantity]} testID={`reading-${key}`} />
            </View>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg },
  fieldWide: { flexBasis: 300, flexGrow: 1 },
  choice: { marginBottom: space.sm },
});
