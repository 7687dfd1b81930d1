import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';

/** Cancel and submit, right-aligned; `testID` names both (`x-cancel`, `x-submit`). */
export function FormButtons({ submitTitle, busy, onSubmit, onCancel, danger, testID }: { submitTitle: string; busy: boolean; onSubmit: () => void; onCancel?: () => void; danger?: boolean; testID: string }) {
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'flex-end' }}>
      {onCancel ? <Button title="Cancel" variant="secondary" onPress={onCancel} testID={`${testID}-cancel`} /> : null}
      <Button title={submitTitle} variant={danger ? 'danger' : 'primary'} busy={busy} onPress={onSubmit} testID={`${testID}-submit`} />
    </View>
  );
}
