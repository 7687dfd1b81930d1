// Reads the module table of an exported web app's scripts (Metro's production output: one
// `__d(factory, id, dependencies)` per module) to check that the way scripts were split can run.
import fs from 'node:fs';
import path from 'node:path';

export interface ScriptModule {
  id: number;
  /** Ids this module requires as soon as it runs. */
  requires: number[];
  /** Ids it loads with import() (or a lazy route), each from the script named beside it. */
  loads: Record<number, string>;
}

const TAIL_LIST = /\},(\d+),\[([\d,]*)\]\);?\s*$/;
const TAIL_OBJECT = /\},(\d+),(\{"0"[^]*\})\);?\s*$/;

/** The modules one script defines. Throws when the script is not in the form this reader knows. */
export function readScriptModules(code: string): ScriptModule[] {
  const starts: number[] = [];
  for (let at = code.indexOf('__d(function'); at >= 0; at = code.indexOf('__d(function', at + 1)) starts.push(at);
  return starts.map((start, i) => {
    const text = code
      .slice(start, starts[i + 1] ?? code.length)
      .replace(/\n(?:__r\(\d+\);\n?)*(?:\/\/#[^\n]*\n?)*$/, '')
      .trimEnd();
    const list = TAIL_LIST.exec(text);
    if (list) return { id: Number(list[1]), requires: list[2] ? list[2].split(',').map(Number) : [], loads: {} };
    const object = TAIL_OBJECT.exec(text);
    if (!object) throw new Error(`cannot read a module's dependencies: …${text.slice(-80)}`);
    const table = JSON.parse(object[2]) as Record<string, number> & { paths?: Record<string, string> };
    const loads = Object.fromEntries(Object.entries(table.paths ?? {}).map(([id, file]) => [Number(id), file]));
    const requires = Object.entries(table)
      .filter(([key]) => key !== 'paths')
      .map(([, id]) => id as number)
      .filter((id) => !(id in loads));
    return { id: Number(object[1]), requires, loads };
  });
}

export interface ScriptProblem {
  script: string;
  module: number;
  missing: number;
}

/**
 * Every module a script requires must be defined in that script or in one that index.html loads first
 * (`eager`); every script an import() names must exist. Returns what is not.
 */
export function unmetRequirements(dir: string, eager: string[]): ScriptProblem[] {
  const scripts = fs.readdirSync(dir).filter((f) => f.endsWith('.js'));
  const modules = new Map(scripts.map((f) => [f, readScriptModules(fs.readFileSync(path.join(dir, f), 'utf8'))]));
  const always = new Set(eager.flatMap((f) => (modules.get(f) ?? []).map((m) => m.id)));
  const problems: ScriptProblem[] = [];
  for (const [script, defined] of modules) {
    const own = new Set(defined.map((m) => m.id));
    for (const m of defined) {
      for (const id of m.requires) if (!own.has(id) && !always.has(id)) problems.push({ script, module: m.id, missing: id });
      for (const [id, file] of Object.entries(m.loads)) if (!modules.has(path.basename(file))) problems.push({ script, module: m.id, missing: Number(id) });
    }
  }
  return problems;
}

/** The scripts index.html loads with <script src>, by file name. */
export function eagerScripts(dist: string): string[] {
  const html = fs.readFileSync(path.join(dist, 'index.html'), 'utf8');
  return [...html.matchAll(/<script src="[^"]*\/([^/"]+\.js)"/g)].map((m) => m[1]);
}

/** Fails the build when a script would ask for a module nobody defines ("Requiring unknown module"). */
export function checkScriptSplit(dist: string) {
  const problems = unmetRequirements(path.join(dist, '_expo/static/js/web'), eagerScripts(dist));
  if (problems.length) {
    const lines = problems.slice(0, 10).map((p) => `${p.script}: module ${p.module} needs ${p.missing}, defined by no script loaded before it`);
    throw new Error(`the web export's scripts cannot run:\n${lines.join('\n')}`);
  }
}
