import { useRef } from 'react';
import { View } from 'react-native';
import { Button } from '@/components/ui/button';

/** A CSV chooser for the web: a hidden <input type="file"> behind a normal button (the image picker takes images only). */
export function FilePicker({ label, onFile, busy, testID }: { label: string; onFile: (file: File) => void; busy?: boolean; testID?: string }) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <View style={{ alignSelf: 'flex-start' }}>
      <input
        ref={input}
        type="file"
        accept=".csv,text/csv"
        style={{ display: 'none' }}
        data-testid={testID ? `${testID}-input` : undefined}
        onChange={(e) => {
          const file = e.currentTarget.files?.[0];
          // Clear it so choosing the same file again (after fixing it) fires another change.
          e.currentTarget.value = '';
          if (file) onFile(file);
        }}
      />
      <Button title={label} variant="secondary" busy={busy} onPress={() => input.current?.click()} testID={testID} />
    </View>
  );
}

export const filePickerAvailable = true;
