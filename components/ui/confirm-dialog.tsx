import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';

interface Props {
  visible: boolean;
  title: string;
  message: string;
  confirmLabel: string;
  danger?: boolean;
  busy?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

export function ConfirmDialog({ visible, title, message, confirmLabel, danger, busy, error, onConfirm, onCancel }: Props) {
  return (
    <Dialog visible={visible} title={title} onClose={onCancel} testID="confirm-dialog">
      <Text>{message}</Text>
      {error ? <Notice tone="danger" word="Not done">{error}</Notice> : null}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'flex-end' }}>
        <Button title="Cancel" variant="secondary" onPress={onCancel} />
        <Button title={confirmLabel} variant={danger ? 'danger' : 'primary'} busy={busy} onPress={onConfirm} testID="confirm-dialog-confirm" />
      </View>
    </Dialog>
  );
}
