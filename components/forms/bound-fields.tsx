import { getIn, useFormikContext } from 'formik';
import type { TextInputProps } from 'react-native';
import { SelectField, type SelectOption } from '@/components/ui/select-field';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/theme';

/** A field's message once it has been touched or the form submitted. */
export function useFieldError(name: string): string | undefined {
  const { errors, touched, submitCount } = useFormikContext();
  const error = getIn(errors, name) as unknown;
  return typeof error === 'string' && (getIn(touched, name) || submitCount > 0) ? error : undefined;
}

/**
 * Any widget bound to a Formik field by its (possibly nested) name: its value, a setter that also marks it
 * touched (so its message shows), and the message to show now. Fields that are not text boxes build on this.
 */
export function useBoundField<V>(name: string) {
  const { values, setFieldValue, setFieldTouched } = useFormikContext();
  return {
    value: getIn(values, name) as V,
    set: (v: V) => { void setFieldValue(name, v); void setFieldTouched(name, true, false); },
    error: useFieldError(name),
  };
}

/** Room for a few lines of text (reasons, notes). */
export const multilineStyle = { minHeight: 88, paddingTop: space.sm, textAlignVertical: 'top' as const };

type TextProps = TextInputProps & { name: string; label: string; hint?: string };

/** A TextField bound to a Formik field by its (possibly nested) name: `<FormTextField name="email" label="E-mail" />`. */
export function FormTextField({ name, label, testID, multiline, style, ...rest }: TextProps) {
  const { values, handleChange, handleBlur } = useFormikContext();
  const value = getIn(values, name);
  return (
    <TextField
      label={label}
      value={value == null ? '' : String(value)}
      onChangeText={handleChange(name)}
      onBlur={handleBlur(name)}
      error={useFieldError(name)}
      testID={testID ?? `field-${name}`}
      multiline={multiline}
      numberOfLines={multiline ? 3 : undefined}
      style={multiline ? [multilineStyle, style] : style}
      {...rest}
    />
  );
}

/** A SelectField bound to a Formik field; '' while nothing is chosen. */
export function FormSelectField<V extends string | number>({ name, label, options, testID, clearable, placeholder }: { name: string; label: string; options: SelectOption<V>[]; testID?: string; clearable?: boolean; placeholder?: string }) {
  const field = useBoundField<V | '' | null | undefined>(name);
  return (
    <SelectField
      label={label}
      value={field.value === '' || field.value == null ? null : field.value}
      options={options}
      clearable={clearable}
      placeholder={placeholder}
      onChange={(v) => field.set(v ?? '')}
      error={field.error}
      testID={testID ?? `field-${name}`}
    />
  );
}

/** The message of a field drawn by other means (chips, a list of points), in the fields' own style. */
export function FieldMessage({ name, testID }: { name: string; testID?: string }) {
  const error = useFieldError(name);
  return error ? <Text variant="small" style={{ color: colors.danger }} accessibilityLiveRegion="polite" testID={testID}>{`⚠ ${error}`}</Text> : null;
}
