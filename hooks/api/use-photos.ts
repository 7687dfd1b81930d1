import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Platform } from 'react-native';
import type { ImagePickerAsset } from 'expo-image-picker';
import { fetchBlob } from '@/hooks/api/request';

const photoKeys = {
  all: ['photos'] as const,
  file: (url: string) => [...photoKeys.all, 'file', url] as const,
};

/** A photo file, fetched with the bearer token. Photos never change once stored, so they stay fresh. */
function usePhotoBlobQuery(url: string | null) {
  return useQuery({
    queryKey: photoKeys.file(url ?? ''),
    queryFn: () => fetchBlob(url!),
    enabled: !!url,
    staleTime: Infinity,
    gcTime: 10 * 60_000,
  });
}

function blobToDataUrl(blob: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error);
    reader.readAsDataURL(blob);
  });
}

/**
 * An image `uri` for an authenticated photo: an object URL on the web (revoked when no longer shown),
 * a data URL on native, where object URLs cannot feed an <Image>.
 */
export function usePhotoUri(url: string | null) {
  const query = usePhotoBlobQuery(url);
  const [uri, setUri] = useState<string | null>(null);
  const blob = query.data;
  useEffect(() => {
    if (!blob) { setUri(null); return; }
    if (Platform.OS === 'web') {
      const objectUrl = URL.createObjectURL(blob);
      setUri(objectUrl);
      return () => URL.revokeObjectURL(objectUrl);
    }
    let live = true;
    void blobToDataUrl(blob).then((d) => { if (live) setUri(d); });
    return () => { live = false; };
  }, [blob]);
  return { uri, isError: query.isError, isPending: !!url && !uri && !query.isError };
}

/** Multipart body for a photo chosen with expo-image-picker, under the field name the API expects. */
export function photoFormData(asset: ImagePickerAsset, field = 'photo'): FormData {
  const form = new FormData();
  const name = asset.fileName ?? `photo-${Date.now()}.jpg`;
  if (asset.file) form.append(field, asset.file, name);
  // React Native's FormData takes a { uri, name, type } descriptor for a local file.
  else form.append(field, { uri: asset.uri, name, type: asset.mimeType ?? 'image/jpeg' } as unknown as Blob);
  return form;
}
