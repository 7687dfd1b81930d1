import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Formik, getIn } from 'formik';
import { View } from 'react-native';
import { colors, space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { SelectField } from '@/components/ui/select-field';
import { Text } from '@/components/ui/text';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { prepareValues, submitForm } from '@/components/forms/submit';
import { SAFETY_LOCATIONS } from '@/components/register/register-vocabulary';
import { useSitesQuery } from '@/hooks/api/use-sites';
import { plantRoomSchema, type PlantRoomInput } from '@/shared/schemas/register';
import type { PlantRoom, SafetyLocations } from '@/shared/types/register';

interface Values {
  siteId: number | null;
  name: string;
  floorArea: string;
  accessNotes: string;
  safety: SafetyLocations;
}

const initialFrom = (room: PlantRoom | undefined, siteId: number | null): Values => ({
  siteId: room?.siteId ?? siteId,
  name: room?.name ?? '',
  floorArea: room?.floorArea ?? '',
  accessNotes: room?.accessNotes ?? '',
  safety: room?.safety ?? { emergencyStop: '', gasIsolation: '', electricalIsolator: '', firstAid: '', exits: '' },
});


export function PlantRoomForm({ room, siteId, submitLabel, onSubmit, onCancel }: { room?: PlantRoom; siteId: number | null; submitLabel: string; onSubmit: (input: PlantRoomInput) => Promise<unknown>; onCancel: () => void }) {
  const sites = useSitesQuery();
  const siteOptions = (sites.data?.items ?? []).map((s) => ({ value: s.id, label: s.name }));
  return (
    <Formik<Values>
      initialValues={initialFrom(room, siteId)}
      validationSchema={plantRoomSchema}
      onSubmit={(values, helpers) => submitForm(helpers, async () => onSubmit(await plantRoomSchema.validate(prepareValues(values), { stripUnknown: true })))}
    >
      {({ values, errors, submitCount, setFieldValue, handleSubmit, isSubmitting }) => (
        <View style={{ gap: space.lg }}>
          <FormStatusBanner word="Not saved" />
          <Card>
            <Text variant="title">Plant room</Text>
            <SelectField
              label="Site"
              value={values.siteId}
              options={siteOptions}
              onChange={(v) => void setFieldValue('siteId', v)}
              error={submitCount > 0 && (getIn(errors, 'siteId') as string)}
              disabled={!!room}
              testID="field-siteId"
            />
            <FormTextField name="name" label="Plant room name" placeholder="e.g. Basement boiler room" />
            <FormTextField name="floorArea" label="Floor or area" placeholder="e.g. Level B1, east core" />
            <FormTextField name="accessNotes" label="Access notes" hint="Keys, codes held by, permits needed, restricted hours" multiline />
          </Card>
          <Card>
            <Text variant="title">Safety-critical locations</Text>
            <Text muted>Say where each one is, as someone new to the room would need to find it.</Text>
            {SAFETY_LOCATIONS.map((l) => (
              <View key={l.key} style={{ flexDirection: 'row', gap: space.sm }}>
                <MaterialCommunityIcons name={l.icon} size={28} color={colors.ink} style={{ marginTop: 28 }} />
                <View style={{ flex: 1 }}>
                  <FormTextField name={`safety.${l.key}`} label={l.label} hint={l.hint} />
                </View>
              </View>
            ))}
          </Card>
          <FormButtons submitTitle={submitLabel} busy={isSubmitting} onSubmit={() => handleSubmit()} onCancel={onCancel} submitFirst testID="plant-room" />
        </View>
      )}
    </Formik>
  );
}
