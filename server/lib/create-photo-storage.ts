import path from 'node:path';
import type { ServerConfig } from '@/server/config';
import type { PhotoStorage } from '@/server/lib/photo-storage';
import { LocalPhotoStorage } from '@/server/lib/photo-storage-local';
import { S3PhotoStorage } from '@/server/lib/photo-storage-s3';

/** The storage driver chosen by STORAGE_DRIVER: local disk under DATA_DIR/photos (default) or S3-compatible. */
export function createPhotoStorage(config: Pick<ServerConfig, 'storage' | 'dataDir'>): PhotoStorage {
  if (config.storage.driver === 's3') return new S3PhotoStorage(config.storage);
  return new LocalPhotoStorage(path.join(config.dataDir, 'photos'));
}
