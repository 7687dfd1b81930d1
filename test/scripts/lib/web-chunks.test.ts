import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readScriptModules, unmetRequirements } from '@/scripts/lib/web-chunks';

// The shape Metro's production serializer writes (metro-runtime require.js `define(factory, moduleId, dependencyMap)`),
// with Expo's `paths` table for import() beside the dependency ids.
const ENTRY = '__d(function(g,r,i,a,m,e,d){e.x=r(d[0])},1,[2]);\n__d(function(g,r,i,a,m,e,d){e.y=1},2,[]);\n__r(1);\n//# sourceMappingURL=/entry.js.map';
const ROUTE = '__d(function(g,r,i,a,m,e,d){r(d[0]);r(d[2])(d[1],d.paths)},10,{"0":2,"1":20,"2":11,"paths":{"20":"/_expo/static/js/web/part-abc.js"}});\n__d(function(g,r,i,a,m,e,d){r(d[0])},11,[12]);';
const PART = '__d(function(g,r,i,a,m,e,d){r(d[0])},20,[2]);';

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'web-chunks-'));
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe('readScriptModules', () => {
  it('reads each module id, what it requires at once and what it loads with import()', () => {
    expect(readScriptModules(ENTRY)).toEqual([
      { id: 1, requires: [2], loads: {} },
      { id: 2, requires: [], loads: {} },
    ]);
    expect(readScriptModules(ROUTE)[0]).toEqual({ id: 10, requires: [2, 11], loads: { 20: '/_expo/static/js/web/part-abc.js' } });
  });

  it('refuses a script it cannot read instead of passing it', () => {
    expect(() => readScriptModules('__d(function(){},oops);')).toThrow(/cannot read/);
  });
});

describe('unmetRequirements', () => {
  it('names a module a script requires that neither it nor an eager script defines, and a missing import() script', () => {
    fs.writeFileSync(path.join(dir, 'entry-1.js'), ENTRY);
    fs.writeFileSync(path.join(dir, 'route-1.js'), ROUTE);
    expect(unmetRequirements(dir, ['entry-1.js'])).toEqual([
      { script: 'route-1.js', module: 10, missing: 20 },
      { script: 'route-1.js', module: 11, missing: 12 },
    ].sort((a, b) => a.module - b.module));
    fs.writeFileSync(path.join(dir, 'part-abc.js'), PART);
    fs.writeFileSync(path.join(dir, 'route-1.js'), ROUTE.replace('},11,[12]);', '},11,[]);'));
    expect(unmetRequirements(dir, ['entry-1.js'])).toEqual([]);
  });
});
