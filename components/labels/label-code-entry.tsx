import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { LABEL_CODE_LENGTH, normaliseLabelCode } from '@/shared/rules/label-code';

/** Typing the code printed under a label: for a damaged QR, a dark corner or a blocked camera. */
export function LabelCodeEntry({ onCode }: { onCode: (code: string) => void }) {
  const [value, setValue] = useState('');
  const [error, setError] = useState<string | null>(null);
  const submit = () => {
    const code = normaliseLabelCode(value);
    if (!code) {
      setError(`A label code has ${LABEL_CODE_LENGTH} letters and digits, as printed under the QR (spaces and dashes do not matter).`);
      return;
    }
    setError(null);
    onCode(code);
  };
  return (
    <View style={{ gap: space.sm }}>
      <TextField
        label="Label code"
        hint="Printed under the QR, e.g. 7KXM-4HAP-R2WC"
        value={value}
        onChangeText={setValue}
        autoCapitalize="characters"
        autoCorrect={false}
        onSubmitEditing={submit}
        error={error ?? undefined}
        testID="scan-code-input"
      />
      <Button title="Open item" onPress={submit} testID="scan-code-submit" />
    </View>
  );
}
