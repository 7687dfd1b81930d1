import { getIn, useFormikContext } from 'formik';
import { Card } from '@/components/ui/card';
import { SelectField } from '@/components/ui/select-field';
import { Text } from '@/components/ui/text';
import { FormTextField } from '@/components/forms/bound-fields';
import { ATTRIBUTE_META, optionLabel } from '@/components/register/register-vocabulary';
import { attributeFields, type AssetFormValues } from '@/components/register/asset-form-values';
import { ASSET_TYPE_LABELS } from '@/shared/rules/register';

/** The fields the chosen type adds (shared/schemas attributeSchemas), with units in their labels. */
export function AssetAttributeFields() {
  const { values, errors, submitCount, setFieldValue } = useFormikContext<AssetFormValues>();
  const fields = attributeFields(values.type);
  if (!values.type || fields.length === 0) return null;
  return (
    <Card>
      <Text variant="title">{`${ASSET_TYPE_LABELS[values.type]} details`}</Text>
      {fields.map((f) => {
        const meta = ATTRIBUTE_META[f.key] ?? { label: f.key };
        const label = meta.unit ? `${meta.label} (${meta.unit})` : meta.label;
        const name = `attributes.${f.key}`;
        if (f.kind === 'choice') {
          return (
            <SelectField
              key={f.key}
              label={label}
              value={values.attributes[f.key] || null}
              options={f.options.map((o) => ({ value: o, label: optionLabel(o) }))}
              onChange={(v) => void setFieldValue(name, v ?? '')}
              placeholder="Not recorded"
              clearable
              error={submitCount > 0 && (getIn(errors, name) as string)}
              testID={`field-${name}`}
            />
          );
        }
        return <FormTextField key={f.key} name={name} label={label} hint={meta.hint} inputMode={f.kind === 'number' ? 'decimal' : 'text'} />;
      })}
    </Card>
  );
}
