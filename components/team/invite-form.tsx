import { Formik } from 'formik';
import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select-field';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ROLE_OPTIONS } from '@/components/team/team-vocabulary';
import { RequestError, errorMessage } from '@/hooks/api/request';
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
        onSubmit={async (values, { setErrors, setStatus, resetForm }) => {
          setStatus(undefined);
          try {
            const member = await invite.mutateAsync(inviteUserSchema.cast(values) as InviteUserInput);
            resetForm();
            setSentTo(member.email);
          } catch (err) {
            if (err instanceof RequestError && err.fields) setErrors(err.fields);
            setStatus(errorMessage(err));
          }
        }}
      >
        {({ handleChange, handleBlur, handleSubmit, setFieldValue, values, errors, touched, isSubmitting, status }) => (
          <View>
            {status ? <Notice tone="danger" word="Not invited">{status}</Notice> : null}
            {sentTo && !status ? <Notice tone="safe" word="Invitation sent">{`An invitation is on its way to ${sentTo}.`}</Notice> : null}
            <View style={{ flexDirection: isWide ? 'row' : 'column', gap: isWide ? space.md : 0, marginTop: space.sm }}>
              <View style={{ flex: 1 }}>
                <TextField label="Name" value={values.name} onChangeText={handleChange('name')} onBlur={handleBlur('name')} error={touched.name && errors.name} testID="invite-name" />
              </View>
              <View style={{ flex: 1 }}>
                <TextField
                  label="E-mail"
                  value={values.email}
                  onChangeText={handleChange('email')}
                  onBlur={handleBlur('email')}
                  error={touched.email && errors.email}
                  autoCapitalize="none"
                  keyboardType="email-address"
                  inputMode="email"
                  testID="invite-email"
                />
              </View>
              <View style={{ flex: 1 }}>
                <SelectField label="Role" value={values.role || null} options={ROLE_OPTIONS} onChange={(r) => void setFieldValue('role', r ?? '')} error={touched.role && errors.role} testID="invite-role" />
              </View>
            </View>
            <Button title="Send invitation" onPress={() => { setSentTo(null); handleSubmit(); }} busy={isSubmitting} testID="invite-submit" style={{ alignSelf: isWide ? 'flex-start' : 'stretch' }} />
          </View>
        )}
      </Formik>
    </Card>
  );
}
