import request from 'supertest';
import type { TestApp } from '@/test/setup/app';

/** Requests as one signed-in user. */
export function as(t: TestApp, token: string) {
  const auth = { Authorization: `Bearer ${token}` };
  return {
    get: (path: string) => request(t.app).get(path).set(auth),
    post: (path: string, body?: object) => request(t.app).post(path).set(auth).send(body),
    patch: (path: string, body: object) => request(t.app).patch(path).set(auth).send(body),
    put: (path: string, body: object) => request(t.app).put(path).set(auth).send(body),
    delete: (path: string) => request(t.app).delete(path).set(auth),
    upload: (path: string, field: string, content: Buffer, filename: string, contentType = 'application/octet-stream') =>
      request(t.app).post(path).set(auth).attach(field, content, { filename, contentType }),
  };
}

export type Client = ReturnType<typeof as>;

/** Creates through the API and returns the body, failing loudly on anything but 201. */
export async function created<T = Record<string, unknown>>(res: Promise<request.Response> | request.Test): Promise<T & { id: number }> {
  const r = await res;
  if (r.status !== 201) throw new Error(`expected 201, got ${r.status}: ${JSON.stringify(r.body)}`);
  return r.body;
}

export const siteBody = (name: string, extra: object = {}) => ({ name, address: '1 Test Lane', timeZone: 'Europe/London', ...extra });
export const roomBody = (siteId: number, name: string, extra: object = {}) => ({
  siteId,
  name,
  floorArea: 'Basement',
  accessNotes: 'Key at reception.',
  safety: { emergencyStop: 'By the door', gasIsolation: 'On the meter', electricalIsolator: 'Panel CP-01', firstAid: 'Reception', exits: 'Door and stair' },
  ...extra,
});
export const assetBody = (siteId: number, plantId: string, extra: object = {}) => ({
  siteId,
  plantId,
  name: `Item ${plantId}`,
  type: 'pump',
  system: 'LTHW heating circuit 1',
  energySources: ['electrical', 'mechanical'],
  ...extra,
});
