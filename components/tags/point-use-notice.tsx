import { Link } from 'expo-router';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { ISOLATION_METHOD_LABELS } from '@/shared/rules/tags';
import type { PointUse } from '@/shared/types/tags';

/** On an item that is itself an isolation point of someone's live tag: do not operate it. */
export function PointUseNotice({ uses }: { uses: PointUse[] }) {
  if (!uses.length) return null;
  return (
    <Notice tone="danger" word="Isolation point" title="Part of a live isolation — do not operate">
      <View style={{ gap: space.xs }} testID="point-use-notice">
        {uses.map((u) => (
          <Link key={`${u.tagId}-${u.forAsset.id}`} href={`/tags/${u.tagId}`}>
            <Text>
              {`${ISOLATION_METHOD_LABELS[u.method]} for work on `}
              <Text bold>{`${u.forAsset.plantId} · ${u.forAsset.name}`}</Text>
              {` — held by ${u.holder.name}`}
            </Text>
          </Link>
        ))}
      </View>
    </Notice>
  );
}
