import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';

interface Props {
  submitTitle: string;
  busy: boolean;
  onSubmit: () => void;
  onCancel?: () => void;
  danger?: boolean;
  /** A whole-page form: submit first, at the start of the row. Otherwise cancel then submit, right-aligned. */
  submitFirst?: boolean;
  testID: string;
}

/** Cancel and submit; `testID` names both (`x-cancel`, `x-submit`). */
export function FormButtons({ submitTitle, busy, onSubmit, onCancel, danger, submitFirst, testID }: Props) {
  const cancel = onCancel ? <Button key="cancel" title="Cancel" variant="secondary" onPress={onCancel} testID={`${testID}-cancel`} /> : null;
  const submit = <Button key="submit" title={submitTitle} variant={danger ? 'danger' : 'primary'} busy={busy} onPress={onSubmit} testID={`${testID}-submit`} />;
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: submitFirst ? 'flex-start' : 'flex-end' }}>
      {submitFirst ? [submit, cancel] : [cancel, submit]}
    </View>
  );
}
