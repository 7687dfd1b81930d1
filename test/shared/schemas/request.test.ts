import { describe, expect, it } from 'vitest';
import { parseId, parseIdList } from '@/shared/rules/ids';
import { MAX_PAGE, MAX_PAGE_SIZE } from '@/shared/rules/paging';
import { queryString } from '@/shared/rules/query-string';
import { idParams, pagingQuery } from '@/shared/schemas/request';

describe('parseId', () => {
  it('reads plain positive whole numbers and nothing else', () => {
    expect(parseId('42')).toBe(42);
    expect(parseId(42)).toBe(42);
    for (const bad of ['abc', '1e999', '1e3', '0x1f', '-3', '1.5', 'Infinity', '', '0', '99999999999999999', null, undefined, ['1'], Number.NaN]) {
      expect(parseId(bad)).toBeNull();
    }
  });
  it('reads a comma-separated list, or refuses it whole', () => {
    expect(parseIdList('3, 4,9')).toEqual([3, 4, 9]);
    expect(parseIdList('3,1e999')).toBeNull();
  });
});

describe('request schemas', () => {
  it('casts a path id and refuses a non-finite one', async () => {
    expect(await idParams.validate({ id: '12' })).toEqual({ id: 12 });
    await expect(idParams.validate({ id: '1e999' })).rejects.toThrow('id must be a positive whole number.');
  });
  it('defaults and caps paging, and refuses an absurd page', async () => {
    expect(await pagingQuery.validate({})).toEqual({ page: 1, pageSize: 50 });
    expect(await pagingQuery.validate({ page: '3', pageSize: '1000' })).toEqual({ page: 3, pageSize: MAX_PAGE_SIZE });
    await expect(pagingQuery.validate({ page: '1e300' })).rejects.toThrow('page must be a whole number.');
    await expect(pagingQuery.validate({ page: String(MAX_PAGE + 1) })).rejects.toThrow(`page must be at most ${MAX_PAGE}.`);
  });
});

describe('queryString', () => {
  it('leaves out empty values and joins lists', () => {
    expect(queryString({ q: 'seal', siteId: 3, kind: undefined, state: null, sort: '', assetIds: [1, 2], none: [] })).toBe('?q=seal&siteId=3&assetIds=1%2C2');
    expect(queryString({ q: '' })).toBe('');
  });
});
