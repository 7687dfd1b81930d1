import { MaterialCommunityIcons } from '@/components/ui/icons';
import { CameraView, useCameraPermissions, type BarcodeScanningResult } from 'expo-camera';
import { use, useRef, useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { prepareScannerWasm } from '@/components/labels/zxing-setup';
import { useTorchSupport } from '@/components/labels/use-torch-support';

const scannerReady = prepareScannerWasm();

/** The camera part of the Scan tab: asks for permission, scans QR codes, offers the torch where the device has one. */
export function LabelScanner({ onScanned, paused }: { onScanned: (text: string) => void; paused: boolean }) {
  // Suspends (inside the lazy part's fallback) until the QR reader points at our own wasm.
  use(scannerReady);
  const [permission, requestPermission] = useCameraPermissions();
  const [torch, setTorch] = useState(false);
  const hasTorch = useTorchSupport();
  const last = useRef<{ text: string; at: number } | null>(null);

  if (!permission) return <Text muted>Checking camera access…</Text>;
  if (!permission.granted) {
    if (!permission.canAskAgain) {
      return (
        <Notice tone="mandatory" word="Camera blocked" title="Isoledger cannot use the camera">
          {Platform.OS === 'web'
            ? 'Allow camera access for this site in your browser (the camera or lock icon beside the address), then reload the page. Meanwhile, type the code printed under the QR below.'
            : 'Allow camera access for Isoledger in your phone’s settings. Meanwhile, type the code printed under the QR below.'}
        </Notice>
      );
    }
    return (
      <View style={styles.ask}>
        <MaterialCommunityIcons name="camera-outline" size={40} color={colors.brand} />
        <Text>Isoledger uses the camera only to read plant labels. Nothing is recorded or sent.</Text>
        <Button title="Allow camera" onPress={() => void requestPermission()} testID="scan-allow-camera" />
      </View>
    );
  }

  const handle = (result: BarcodeScanningResult) => {
    if (paused) return;
    const now = Date.now();
    // The same code is reported many times a second while it stays in view: act on it once.
    if (last.current && last.current.text === result.data && now - last.current.at < 3000) return;
    last.current = { text: result.data, at: now };
    onScanned(result.data);
  };

  return (
    <View style={styles.frame} testID="scan-camera">
      <CameraView style={StyleSheet.absoluteFill} facing="back" enableTorch={torch} barcodeScannerSettings={{ barcodeTypes: ['qr'] }} onBarcodeScanned={handle} />
      <View style={styles.target} pointerEvents="none" />
      {hasTorch ? (
        <View style={styles.torch}>
          <Button title={torch ? 'Torch off' : 'Torch on'} variant="secondary" onPress={() => setTorch((t) => !t)} testID="scan-torch" accessibilityState={{ checked: torch }} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  ask: { gap: space.md, alignItems: 'flex-start', padding: space.lg, backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line },
  frame: { width: '100%', aspectRatio: 3 / 4, maxHeight: 520, borderRadius: radius.lg, overflow: 'hidden', backgroundColor: colors.ink },
  target: { position: 'absolute', top: '20%', left: '15%', right: '15%', bottom: '20%', borderWidth: 4, borderColor: colors.caution, borderRadius: radius.md },
  torch: { position: 'absolute', bottom: space.md, right: space.md },
});
