import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { PhotoThumb } from '@/components/ui/photo-thumb';
import { Text } from '@/components/ui/text';
import { formatDate } from '@/components/register/register-vocabulary';
import { pickPhoto } from '@/components/register/pick-photo';
import { errorMessage } from '@/hooks/api/request';
import type { ImagePickerAsset } from 'expo-image-picker';
import type { Photo } from '@/shared/types/register';

interface Props {
  photos: Photo[];
  /** Label for what the photos show, e.g. "P-HW-01". */
  subject: string;
  /** Upload one photo; absent when the user may not add photos. */
  onAdd?: (asset: ImagePickerAsset) => Promise<unknown>;
  adding?: boolean;
}

/** Thumbnails that open full size, and an "Add photo" button. */
export function PhotoGallery({ photos, subject, onAdd, adding }: Props) {
  const [open, setOpen] = useState<Photo | null>(null);
  const [error, setError] = useState<string | null>(null);
  const add = async () => {
    setError(null);
    try {
      const asset = await pickPhoto();
      if (asset && onAdd) await onAdd(asset);
    } catch (err) {
      setError(errorMessage(err));
    }
  };
  return (
    <View style={{ gap: space.md }}>
      {photos.length === 0 ? <Text muted>No photos yet.</Text> : null}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
        {photos.map((p, i) => (
          <PhotoThumb key={p.id} url={p.thumbnailUrl} size={104} label={`Photo ${i + 1} of ${subject}`} onPress={() => setOpen(p)} testID={`photo-${p.id}`} />
        ))}
      </View>
      {error ? <Notice tone="danger" word="Photo not added">{error}</Notice> : null}
      {onAdd ? <Button title="Add photo" variant="secondary" onPress={() => void add()} busy={adding} testID="add-photo" /> : null}
      <Dialog visible={!!open} title={`Photo of ${subject}`} onClose={() => setOpen(null)} wide>
        {open ? (
          <>
            <PhotoThumb url={open.url} size={0} aspectRatio={open.width && open.height ? open.width / open.height : 4 / 3} label={`Photo of ${subject}, full size`} testID="photo-full" />
            <Text variant="small" muted>{`${open.caption ? `${open.caption} · ` : ''}Added by ${open.createdBy.name} on ${formatDate(open.createdAt)}`}</Text>
            <Button title="Close" variant="secondary" onPress={() => setOpen(null)} />
          </>
        ) : null}
      </Dialog>
    </View>
  );
}
