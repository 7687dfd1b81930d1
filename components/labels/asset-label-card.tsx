import { formatDate } from '@/components/register/register-vocabulary';
import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import QRCode from 'react-native-qrcode-svg';
import { colors, printColors, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Text } from '@/components/ui/text';
import { PrintLabelsButtons } from '@/components/labels/print-labels-buttons';
import { errorMessage } from '@/hooks/api/request';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { useReplaceLabelMutation, useRetiredLabelsQuery } from '@/hooks/api/use-labels';
import { formatLabelCode, labelUrl } from '@/shared/rules/label-code';
import type { Asset } from '@/shared/types/register';

// The web app is served from PUBLIC_URL, so its origin is what printed labels encode.
const origin = () => (Platform.OS === 'web' && typeof window !== 'undefined' ? window.location.origin : process.env.EXPO_PUBLIC_API_URL ?? '');

/** The item's QR label on screen (for showing or scanning from another phone), printing and replacement. */
export function AssetLabelCard({ asset }: { asset: Asset }) {
  const { may } = usePermissions();
  const replace = useReplaceLabelMutation(asset.id);
  const retired = useRetiredLabelsQuery(asset.id);
  const [confirming, setConfirming] = useState(false);
  const canReplace = may('replaceLabel') && !asset.archived;
  return (
    <Card>
      <Text variant="title">Plant label</Text>
      <View style={styles.row}>
        <View style={styles.qr} testID="asset-label-qr">
          <QRCode value={labelUrl(origin(), asset.labelCode)} size={148} ecl="M" quietZone={12} backgroundColor={printColors.paper} color={printColors.ink} />
        </View>
        <View style={{ flex: 1, minWidth: 160, gap: space.xs }}>
          <Text variant="small" muted>Label code</Text>
          <Text variant="title" selectable testID="asset-label-code">{formatLabelCode(asset.labelCode)}</Text>
          <Text variant="small" muted>Scanning the label or typing this code opens this record.</Text>
        </View>
      </View>
      <PrintLabelsButtons selection={{ assetIds: [asset.id] }} fileStem={asset.plantId} />
      {canReplace ? <Button title="Replace label…" variant="quiet" onPress={() => setConfirming(true)} testID="replace-label" /> : null}
      {retired.data?.length ? (
        <Text variant="small" muted>
          Earlier labels, no longer valid: {retired.data.map((r) => `${formatLabelCode(r.code)} (replaced ${formatDate(r.retiredAt)})`).join(', ')}
        </Text>
      ) : null}
      <ConfirmDialog
        visible={confirming}
        title="Replace this label?"
        message={`A new code is issued and the label ${formatLabelCode(asset.labelCode)} stops opening this item. Print the new label and remove the old one from the plant.`}
        confirmLabel="Issue new code"
        busy={replace.isPending}
        error={replace.isError ? errorMessage(replace.error) : null}
        onConfirm={() => void replace.mutateAsync().then(() => setConfirming(false)).catch(() => {})}
        onCancel={() => setConfirming(false)}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.lg },
  qr: { padding: space.sm, backgroundColor: printColors.paper, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line },
});
