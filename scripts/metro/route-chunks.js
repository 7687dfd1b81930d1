// @ts-check
/*
 * How the web export splits scripts between routes (loaded by metro.config.js).
 *
 * Expo's serializer (SDK 57, @expo/metro-config serializer/serializeChunks.js) gives each async route and each
 * import() a script of its own, and moves every module that two or more of those scripts share into one
 * `__common` script that index.html loads before anything renders. With thirty routes that share forms, charts,
 * engineering tables and the register, that common script grows with every screen: most of it is not needed by
 * the page being opened (sign-in, a label's record). Expo exposes no setting for it.
 *
 * Here, just before file names are hashed, the common script keeps only the modules the layouts need (the app
 * shell, which every page renders anyway); any other shared module goes back into each route or lazy part that
 * uses it. A module defined by two scripts is harmless: Metro's runtime `define` keeps the first and ignores
 * the second, and module ids are the same in every script. The cost is bytes repeated across route scripts
 * (all of them precached by the service worker); the gain is that a page downloads only what it renders.
 */
const path = require('node:path');
const chunkFilenames = require('@expo/metro-config/build/serializer/computeChunkFilenames');

const LAYOUT = /^app\/(?:.+\/)?_layout\.[cm]?[jt]sx?$/;
let installed = false;

/** Modules reachable from `roots` through static imports (import() and lazy routes start scripts of their own). */
function staticClosure(graph, roots) {
  const seen = new Set();
  const stack = [...roots];
  while (stack.length) {
    const module = stack.pop();
    if (seen.has(module)) continue;
    seen.add(module);
    for (const dependency of module.dependencies.values()) {
      if (dependency.data.data.asyncType || !dependency.absolutePath) continue;
      const next = graph.dependencies.get(dependency.absolutePath);
      if (next) stack.push(next);
    }
  }
  return seen;
}

/** Same lookup as Expo's makeChunkByPathLookupMap: entry modules first, then unsealed chunks' modules, then sealed ones'. */
function refillChunksByPath(chunks, chunksByPath) {
  chunksByPath.clear();
  const put = (p, chunk) => { if (!chunksByPath.has(p)) chunksByPath.set(p, chunk); };
  for (const chunk of chunks) for (const entry of chunk.entries) put(entry.path, chunk);
  for (const chunk of chunks) if (!chunk.sealed) for (const module of chunk.deps) put(module.path, chunk);
  for (const chunk of chunks) if (chunk.sealed) for (const module of chunk.deps) put(module.path, chunk);
}

/** Keeps in `__common` only what the layouts need; returns how many modules went back to the routes. */
function keepCommonForLayouts(chunks, chunksByPath) {
  const all = [...chunks];
  const common = all.find((chunk) => chunk.isVendor && !chunk.isAsync && chunk.name === '/__common.js');
  if (!common || common.options.dev) return 0;
  const { graph, options } = common;
  const asyncChunks = all.filter((chunk) => chunk.isAsync && !chunk.sealed && chunk !== common);
  const layoutRoots = asyncChunks.flatMap((chunk) => [...chunk.entries].filter((m) => LAYOUT.test(path.relative(options.projectRoot, m.path).split(path.sep).join('/'))));
  const shell = staticClosure(graph, layoutRoots);
  const moved = new Set();
  for (const chunk of asyncChunks) {
    for (const module of staticClosure(graph, chunk.entries)) {
      if (common.deps.has(module) && !shell.has(module)) {
        chunk.deps.add(module);
        moved.add(module);
      }
    }
  }
  for (const module of moved) common.deps.delete(module);
  refillChunksByPath(chunks, chunksByPath);
  return moved.size;
}

function install() {
  if (installed) return;
  installed = true;
  const precompute = chunkFilenames.precomputeChunkFilenames;
  chunkFilenames.precomputeChunkFilenames = (args) => {
    keepCommonForLayouts(args.chunks, args.chunksByPath);
    return precompute(args);
  };
}

module.exports = { install, keepCommonForLayouts, staticClosure };
