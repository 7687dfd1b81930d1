import { Formik } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { prepareValues, submitForm } from '@/components/forms/submit';
import { siteSchema, type SiteInput } from '@/shared/schemas/register';
import type { Site } from '@/shared/types/register';

type Values = Record<keyof SiteInput, string>;

const initialFrom = (s?: Site): Values => ({
  name: s?.name ?? '',
  address: s?.address ?? '',
  timeZone: s?.timeZone ?? 'Europe/London',
  clientContactName: s?.clientContactName ?? '',
  clientContactPhone: s?.clientContactPhone ?? '',
  clientContactEmail: s?.clientContactEmail ?? '',
});

export function SiteForm({ site, submitLabel, onSubmit, onCancel }: { site?: Site; submitLabel: string; onSubmit: (input: SiteInput) => Promise<unknown>; onCancel: () => void }) {
  return (
    <Formik<Values>
      initialValues={initialFrom(site)}
      validationSchema={siteSchema}
      onSubmit={(values, helpers) => submitForm(helpers, async () => onSubmit(await siteSchema.validate(prepareValues(values), { stripUnknown: true })))}
    >
      {({ handleSubmit, isSubmitting }) => (
        <View style={{ gap: space.lg }}>
          <FormStatusBanner word="Not saved" />
          <Card>
            <Text variant="title">Site</Text>
            <FormTextField name="name" label="Site name" />
            <FormTextField name="address" label="Address" multiline style={{ minHeight: 96 }} />
            <FormTextField name="timeZone" label="Time zone" hint="Region and city, e.g. Europe/London or America/New_York" autoCapitalize="none" autoCorrect={false} />
          </Card>
          <Card>
            <Text variant="title">Client contact</Text>
            <FormTextField name="clientContactName" label="Name" autoComplete="off" />
            <FormTextField name="clientContactPhone" label="Phone" inputMode="tel" autoComplete="off" />
            <FormTextField name="clientContactEmail" label="E-mail" inputMode="email" autoCapitalize="none" autoComplete="off" />
          </Card>
          <FormButtons submitTitle={submitLabel} busy={isSubmitting} onSubmit={() => handleSubmit()} onCancel={onCancel} submitFirst testID="site" />
        </View>
      )}
    </Formik>
  );
}
