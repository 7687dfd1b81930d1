import { getIn, useFormikContext } from 'formik';
import type { TextInputProps } from 'react-native';
import { SelectField, type SelectOption } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';

/** A field's message once it has been touched or the form submitted. */
function useFieldError(name: string): string | undefined {
  const { errors, touched, submitCount } = useFormikContext();
  const error = getIn(errors, name) as string | undefined;
  return error && (getIn(touched, name) || submitCount > 0) ? error : undefined;
}

/** A TextField bound to a Formik field by its (possibly nested) name: `<FormTextField name="email" label="E-mail" />`. */
export function FormTextField({ name, label, testID, ...rest }: TextInputProps & { name: string; label: string; hint?: string }) {
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
      {...rest}
    />
  );
}

/** A SelectField bound to a Formik field; '' while nothing is chosen. */
export function FormSelectField<V extends string | number>({ name, label, options, testID, clearable }: { name: string; label: string; options: SelectOption<V>[]; testID?: string; clearable?: boolean }) {
  const { values, setFieldValue, setFieldTouched } = useFormikContext();
  const value = getIn(values, name) as V | '' | null | undefined;
  return (
    <SelectField
      label={label}
      value={value === '' || value == null ? null : value}
      options={options}
      clearable={clearable}
      onChange={(v) => { void setFieldValue(name, v ?? ''); void setFieldTouched(name, true, false); }}
      error={useFieldError(name)}
      testID={testID ?? `field-${name}`}
    />
  );
}
