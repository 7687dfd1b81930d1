import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { PhotoThumb } from '@/components/ui/photo-thumb';
import { pickPhoto } from '@/components/register/pick-photo';
import { errorMessage } from '@/hooks/api/request';
import { useAddAssetPhotoMutation } from '@/hooks/api/use-assets';
import type { Asset, Photo } from '@/shared/types/register';

/** After adding an item on a walk-round: photograph it, move on to the next one, or open the record. */
export function AssetSavedPanel({ asset, onAnother, onOpen }: { asset: Asset; onAnother: () => void; onOpen: () => void }) {
  const addPhoto = useAddAssetPhotoMutation(asset.id);
  const [photos, setPhotos] = useState<Photo[]>([]);
  const [error, setError] = useState<string | null>(null);
  const add = async () => {
    setError(null);
    try {
      const picked = await pickPhoto();
      if (picked) {
        const photo = await addPhoto.mutateAsync(picked);
        setPhotos((p) => [...p, photo]);
      }
    } catch (err) {
      setError(errorMessage(err));
    }
  };
  return (
    <Card>
      <Notice tone="safe" word="Saved">{`${asset.plantId} · ${asset.name} is in the register.`}</Notice>
      {photos.length ? (
        <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }} testID="saved-photos">
          {photos.map((p) => <PhotoThumb key={p.id} url={p.thumbnailUrl} size={88} label={`Photo of ${asset.plantId}`} />)}
        </View>
      ) : null}
      {error ? <Notice tone="danger" word="Photo not added">{error}</Notice> : null}
      <View style={{ gap: space.sm }}>
        <Button title={photos.length ? 'Add another photo' : 'Add photo'} onPress={() => void add()} busy={addPhoto.isPending} testID="saved-add-photo" />
        <Button title={asset.plantRoomName ? `Add another item in ${asset.plantRoomName}` : 'Add another item at this site'} variant="secondary" onPress={onAnother} testID="saved-add-another" />
        <Button title="Open the item" variant="quiet" onPress={onOpen} testID="saved-open" />
      </View>
    </Card>
  );
}
