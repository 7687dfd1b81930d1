import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readStorageConfig, type StorageConfig } from '@/server/config';
import { createPhotoStorage } from '@/server/lib/create-photo-storage';
import { PhotoNotStoredError } from '@/server/lib/photo-storage';
import { Photo } from '@/server/models/photo.model';
import { freePort } from '@/scripts/lib/mariadb';
import { createOrganisation, setupTestApp, tokenFor, type TestApp } from '@/test/setup/app';
import { exifGpsLatitude, jpegWithGps } from '@/test/server/support/images';
import { as, assetBody, created, siteBody } from '@/test/server/support/register';

const BUCKET = 'isoledger-photos';
let s3rver: S3rver;
let s3Dir: string;
let storage: Extract<StorageConfig, { driver: 's3' }>;
let t: TestApp;

beforeAll(async () => {
  s3Dir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-s3rver-'));
  const port = await freePort();
  s3rver = new S3rver({ address: '127.0.0.1', port, silent: true, directory: s3Dir, configureBuckets: [{ name: BUCKET }] });
  await s3rver.run();
  // s3rver's built-in credentials (its README).
  storage = readStorageConfig({
    STORAGE_DRIVER: 's3',
    S3_ENDPOINT: `http://127.0.0.1:${port}`,
    S3_BUCKET: BUCKET,
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
  }) as Extract<StorageConfig, { driver: 's3' }>;
  t = await setupTestApp({ storage });
});
afterAll(async () => {
  await t.close();
  await s3rver.close();
  fs.rmSync(s3Dir, { recursive: true, force: true });
});

describe('S3 photo storage', () => {
  it('reads its settings from the environment, path-style by default', () => {
    expect(storage).toMatchObject({ driver: 's3', bucket: BUCKET, forcePathStyle: true, accessKeyId: 'S3RVER' });
    expect(() => readStorageConfig({ STORAGE_DRIVER: 's3' })).toThrow(/S3_BUCKET/);
    expect(() => readStorageConfig({ STORAGE_DRIVER: 'ftp' })).toThrow(/local.*s3/);
    expect(readStorageConfig({})).toEqual({ driver: 'local' });
  });

  it('puts and gets bytes, and reports a missing key as not stored', async () => {
    const driver = createPhotoStorage({ storage, dataDir: '/nonexistent' });
    const bytes = Buffer.from([1, 2, 3, 250, 251, 252]);
    await driver.put('7/abc.jpg', bytes, 'image/jpeg');
    expect(Buffer.compare(await driver.get('7/abc.jpg'), bytes)).toBe(0);
    await expect(driver.get('7/missing.jpg')).rejects.toBeInstanceOf(PhotoNotStoredError);
    await expect(driver.put('../escape.jpg', bytes, 'image/jpeg')).rejects.toThrow(/Unsafe/);
  });

  it('stores an uploaded photo in the bucket and serves it back through the API', async () => {
    const { users } = await createOrganisation('alder');
    const engineer = as(t, await tokenFor(t.app, users.engineer));
    const supervisor = as(t, await tokenFor(t.app, users.supervisor));
    const site = await created(supervisor.post('/api/sites', siteBody('Bucket House')));
    const asset = await created(engineer.post('/api/assets', assetBody(site.id, 'B-01')));
    const res = await engineer.upload(`/api/assets/${asset.id}/photos`, 'photo', await jpegWithGps(), 'b01.jpg', 'image/jpeg');
    expect(res.status).toBe(201);
    const row = await Photo.findByPk(res.body.id);

    const client = new S3Client({
      endpoint: storage.endpoint, region: storage.region, forcePathStyle: true,
      credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    });
    const listed = await client.send(new ListObjectsV2Command({ Bucket: BUCKET, Prefix: `${users.engineer.organisationId}/` }));
    expect(listed.Contents?.map((o) => o.Key).sort()).toEqual([row!.storageKey, row!.thumbnailKey].sort());
    const object = await client.send(new GetObjectCommand({ Bucket: BUCKET, Key: row!.storageKey }));
    expect(object.ContentType).toBe('image/jpeg');
    const inBucket = Buffer.from(await object.Body!.transformToByteArray());
    expect(exifGpsLatitude((await sharp(inBucket).metadata()).exif)).toBeNull();

    const served = await engineer.get(res.body.url);
    expect(served.status).toBe(200);
    expect(Buffer.compare(served.body, inBucket)).toBe(0);
    // Nothing went to the local photo folder.
    expect(fs.existsSync(path.join(t.config.dataDir, 'photos'))).toBe(false);
  });
});
