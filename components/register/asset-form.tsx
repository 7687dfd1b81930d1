import { Formik, getIn, type FormikHelpers } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select-field';
import { Text } from '@/components/ui/text';
import { AssetAttributeFields } from '@/components/register/asset-attribute-fields';
import { toAssetInput, validateAssetForm, type AssetFormValues } from '@/components/register/asset-form-values';
import { EnergyToggles } from '@/components/register/energy-chips';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { formatDate } from '@/components/register/register-vocabulary';
import { useSitePlantRoomsQuery } from '@/hooks/api/use-plant-rooms';
import { useSitesQuery } from '@/hooks/api/use-sites';
import { ASSET_TYPES, ASSET_TYPE_LABELS, nextServiceDue } from '@/shared/rules/register';
import type { AssetInput } from '@/shared/schemas/register';

interface Props {
  initialValues: AssetFormValues;
  submitLabel: string;
  onSubmit: (input: AssetInput) => Promise<unknown>;
  onCancel: () => void;
}

const TYPE_OPTIONS = ASSET_TYPES.map((t) => ({ value: t, label: ASSET_TYPE_LABELS[t] }));

/** One form for adding and editing a plant item; the most-used fields first for a quick walk-round. */
export function AssetForm({ initialValues, submitLabel, onSubmit, onCancel }: Props) {
  const submit = (values: AssetFormValues, helpers: FormikHelpers<AssetFormValues>) => submitForm(helpers, async () => onSubmit(await toAssetInput(values)));
  return (
    <Formik<AssetFormValues> initialValues={initialValues} validate={validateAssetForm} onSubmit={submit}>
      {({ values, errors, submitCount, setFieldValue, handleSubmit, isSubmitting, status }) => {
        const err = (name: string) => submitCount > 0 && (getIn(errors, name) as string | undefined);
        const due = nextServiceDue(/^\d{4}-\d{2}-\d{2}$/.test(values.lastServiceDate) ? values.lastServiceDate : null, Number(values.serviceIntervalMonths) || null);
        return (
          <View style={{ gap: space.lg }}>
            <FormStatusBanner word="Not saved" />
            {submitCount > 0 && Object.keys(errors).length > 0 && !status ? <Notice tone="caution" word="Check the form">Some fields need attention; each says what is wrong.</Notice> : null}
            <Card>
              <Text variant="title">Where</Text>
              <PlaceFields siteId={values.siteId} plantRoomId={values.plantRoomId} siteError={err('siteId')} onSite={(v) => { void setFieldValue('siteId', v); void setFieldValue('plantRoomId', null); }} onRoom={(v) => void setFieldValue('plantRoomId', v)} />
            </Card>
            <Card>
              <Text variant="title">Item</Text>
              <SelectField label="Type" value={values.type || null} options={TYPE_OPTIONS} onChange={(v) => void setFieldValue('type', v ?? '')} error={err('type')} testID="field-type" />
              <FormTextField name="plantId" label="Plant ID" hint="As written on the plant or the drawings, e.g. B-01, P-HW-02" autoCapitalize="characters" autoCorrect={false} />
              <FormTextField name="name" label="Name" placeholder="e.g. Heating secondary pump 1" />
              <FormTextField name="system" label="System" placeholder="e.g. LTHW heating, DHW" />
              <Text variant="label" bold>Energy sources</Text>
              <EnergyToggles value={values.energySources} onChange={(v) => void setFieldValue('energySources', v)} />
            </Card>
            <AssetAttributeFields />
            <Card>
              <Text variant="title">Maker and service</Text>
              <FormTextField name="manufacturer" label="Manufacturer" />
              <FormTextField name="model" label="Model" />
              <FormTextField name="serialNumber" label="Serial number" autoCorrect={false} />
              <FormTextField name="installDate" label="Install date" placeholder="YYYY-MM-DD" inputMode="numeric" />
              <FormTextField name="serviceIntervalMonths" label="Service interval (months)" inputMode="numeric" />
              <FormTextField name="lastServiceDate" label="Last service date" placeholder="YYYY-MM-DD" inputMode="numeric" />
              {due ? <Text muted>{`Next service due ${formatDate(due)}`}</Text> : null}
            </Card>
            <Card>
              <FormTextField name="notes" label="Notes" multiline numberOfLines={4} style={{ minHeight: 104 }} />
            </Card>
            <FormButtons submitTitle={submitLabel} busy={isSubmitting} onSubmit={() => handleSubmit()} onCancel={onCancel} submitFirst testID="asset" />
          </View>
        );
      }}
    </Formik>
  );
}

function PlaceFields({ siteId, plantRoomId, siteError, onSite, onRoom }: { siteId: number | null; plantRoomId: number | null; siteError?: string | false; onSite: (v: number | null) => void; onRoom: (v: number | null) => void }) {
  const sites = useSitesQuery();
  const rooms = useSitePlantRoomsQuery(siteId);
  return (
    <>
      <SelectField label="Site" value={siteId} options={(sites.data?.items ?? []).map((s) => ({ value: s.id, label: s.name }))} onChange={onSite} error={siteError} testID="field-siteId" />
      <SelectField label="Plant room" value={plantRoomId} options={(rooms.data?.items ?? []).map((r) => ({ value: r.id, label: r.name }))} onChange={onRoom} placeholder="Not in a plant room" clearable disabled={!siteId} testID="field-plantRoomId" />
    </>
  );
}
