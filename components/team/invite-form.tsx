import { Formik } from 'formik';
import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { ROLE_OPTIONS } from '@/components/team/team-vocabulary';
import { FormSelectField, FormTextField } from '@/components/forms/bound-fields';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { useInviteUserMutation } from '@/hooks/api/use-team';
import { INVITE_TTL_HOURS } from '@/shared/rules/notifications';
import type { Role } from '@/shared/rules/roles';
import { inviteUserSchema, type InviteUserInput } from '@/shared/schemas/team';

type Values = Omit<InviteUserInput, 'role'> & { role: Role | '' };

/** Invites a person by e-mail; they choose their own password from the link. */
export function InviteForm() {
  const invite = useInviteUserMutation();
  const { isWide } = useBreakpoints();
  const [sentTo, setSentTo] = useState<string | null>(null);
  return (
    <Card>
      <Text variant="title">Invite someone</Text>
      <Text muted>{`They get an e-mail with a link to choose their password. The link works once, for ${INVITE_TTL_HOURS / 24} days.`}</Text>
      <Formik<Values>
        initialValues={{ name: '', email: '', role: '' }}
        validationSchema={inviteUserSchema}
        onSubmit={async (values, helpers) => {
          const member = await submitForm(helpers, () => invite.mutateAsync(inviteUserSchema.cast(values) as InviteUserInput));
          if (!member) return;
          helpers.resetForm();
          setSentTo(member.email);
        }}
      >
        {({ handleSubmit, isSubmitting, status }) => (
          <View>
            <FormStatusBanner word="Not invited" />
            {sentTo && !status ? <Notice tone="safe" word="Invitation sent">{`An invitation is on its way to ${sentTo}.`}</Notice> : null}
            <View style={{ flexDirection: isWide ? 'row' : 'column', gap: isWide ? space.md : 0, marginTop: space.sm }}>
              <View style={{ flex: 1 }}>
                <FormTextField name="name" label="Name" testID="invite-name" />
              </View>
              <View style={{ flex: 1 }}>
                <FormTextField name="email" label="E-mail" autoCapitalize="none" keyboardType="email-address" inputMode="email" testID="invite-email" />
              </View>
              <View style={{ flex: 1 }}>
                <FormSelectField name="role" label="Role" options={ROLE_OPTIONS} testID="invite-role" />
              </View>
            </View>
            <Button title="Send invitation" onPress={() => { setSentTo(null); handleSubmit(); }} busy={isSubmitting} testID="invite-submit" style={{ alignSelf: isWide ? 'flex-start' : 'stretch' }} />
          </View>
        )}
      </Formik>
    </Card>
  );
}
