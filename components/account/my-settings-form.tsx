import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Formik } from 'formik';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { useUpdateMySettingsMutation } from '@/hooks/api/use-account';
import { NOTIFICATION_LABELS, type NotificationKey } from '@/shared/rules/notifications';
import { mySettingsSchema } from '@/shared/schemas/team';
import type { MySettings } from '@/shared/types/team';

interface Values {
  contactPhone: string;
  notifications: Partial<Record<NotificationKey, boolean>>;
}

/** Contact phone and the e-mails this person wants, limited to the ones their role can receive. */
export function MySettingsForm({ settings }: { settings: MySettings }) {
  const update = useUpdateMySettingsMutation();
  const initial: Values = {
    contactPhone: settings.contactPhone ?? '',
    notifications: Object.fromEntries(settings.available.map((k) => [k, settings.notifications[k]])),
  };
  return (
    <Formik<Values>
      initialValues={initial}
      validationSchema={mySettingsSchema}
      onSubmit={async (values, helpers) => {
        const saved = await submitForm(helpers, () => update.mutateAsync(mySettingsSchema.cast({ contactPhone: values.contactPhone.trim() || null, notifications: values.notifications })));
        // The saved values become the new starting point, so the form is no longer dirty.
        if (saved) helpers.resetForm({ values, status: { saved: true } });
      }}
    >
      {({ handleSubmit, setFieldValue, values, isSubmitting, status, dirty }) => {
        const saved = !!(status as { saved?: boolean } | undefined)?.saved;
        return (
          <Card>
            <Text variant="title">Contact and e-mails</Text>
            <FormTextField
              name="contactPhone"
              label="Contact phone"
              hint="Filled in on tags you raise and shown on the board, so a supervisor can reach you."
              keyboardType="phone-pad"
              inputMode="tel"
              autoComplete="tel"
              placeholder="+44 7700 900000"
              testID="settings-phone"
            />
            <Text variant="label" bold>E-mails I receive</Text>
            {settings.available.length === 0 ? (
              <Text muted testID="settings-no-emails">Your role receives no notification e-mails; only invitation and password links.</Text>
            ) : (
              <View style={{ gap: space.xs }} role="group" aria-label="E-mails I receive">
                {settings.available.map((k) => {
                  const on = !!values.notifications[k];
                  return (
                    <Pressable
                      key={k}
                      role="checkbox"
                      aria-checked={on}
                      accessibilityLabel={NOTIFICATION_LABELS[k]}
                      onPress={() => void setFieldValue(`notifications.${k}`, !on)}
                      style={StyleSheet.flatten([styles.option, on && styles.optionOn])}
                      testID={`settings-mail-${k}`}
                    >
                      <MaterialCommunityIcons name={on ? 'checkbox-marked' : 'checkbox-blank-outline'} size={26} color={on ? colors.brand : colors.inkMuted} />
                      <Text style={{ flex: 1 }}>{NOTIFICATION_LABELS[k]}</Text>
                    </Pressable>
                  );
                })}
              </View>
            )}
            <Text variant="small" muted testID="settings-mail-from">
              {`E-mails go to ${settings.email}. They come from this Isoledger server's own sending address, never from a person; if they land in junk, mark that sender as safe. Invitation and password links are always sent.`}
            </Text>
            {saved ? null : <FormStatusBanner word="Not saved" />}
            {saved && !dirty ? <Notice tone="safe" word="Saved">Your settings are saved.</Notice> : null}
            <Button title="Save settings" onPress={() => handleSubmit()} busy={isSubmitting} disabled={!dirty} testID="settings-save" style={{ alignSelf: 'flex-start' }} />
          </Card>
        );
      }}
    </Formik>
  );
}

const styles = StyleSheet.create({
  option: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: layout.minTouch, paddingHorizontal: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line },
  optionOn: { backgroundColor: colors.surfaceSunk, borderColor: colors.ink },
});
