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
const serializeChunks = require('@expo/metro-config/build/serializer/serializeChunks');

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

/** The module an async dependency (import(), a lazy route) loads, unless it is a worker's. */
function asyncTargets(graph, modules) {
  const targets = new Set();
  for (const module of modules) {
    for (const dependency of module.dependencies.values()) {
      const type = dependency.data.data.asyncType;
      if (!type || type === 'worker' || !dependency.absolutePath) continue;
      const target = graph.dependencies.get(dependency.absolutePath);
      if (target) targets.add(target);
    }
  }
  return targets;
}

/**
 * Keeps in `__common` only what the layouts need. Every other async script then holds all it imports statically
 * except what the entry script and that common part already define. An import() whose script Expo dropped
 * (all its modules had gone to `__common`) gets a script of its own again, so it stays lazy.
 */
function keepCommonForLayouts(chunks, chunksByPath) {
  const all = [...chunks];
  const common = all.find((chunk) => chunk.isVendor && !chunk.isAsync && chunk.name === '/__common.js');
  const entry = all.find((chunk) => chunk.isEntry && !chunk.isAsync && !chunk.sealed);
  if (!common || !entry || common.options.dev) return;
  const { graph, options } = common;
  const isLayout = (m) => LAYOUT.test(path.relative(options.projectRoot, m.path).split(path.sep).join('/'));
  const asyncChunks = () => [...chunks].filter((chunk) => chunk.isAsync && !chunk.sealed);
  const shell = staticClosure(graph, asyncChunks().flatMap((chunk) => [...chunk.entries].filter(isLayout)));
  const keep = new Set([...common.deps].filter((m) => shell.has(m)));
  const eager = (m) => entry.deps.has(m) || keep.has(m);
  const hasOwnChunk = (m) => [...chunks].some((chunk) => chunk.isAsync && chunk.entries.has(m));
  const { Chunk } = serializeChunks;
  const required = asyncChunks()[0]?.requiredChunks ?? new Set();
  for (let todo = asyncChunks(); todo.length; ) {
    const created = [];
    for (const chunk of todo) {
      const closure = staticClosure(graph, chunk.entries);
      for (const module of closure) if (!eager(module)) chunk.deps.add(module);
      for (const target of asyncTargets(graph, closure)) {
        if (eager(target) || hasOwnChunk(target)) continue;
        const lazy = new Chunk(target.path, new Set([target]), graph, options, true);
        lazy.requiredChunks = new Set(required);
        chunks.add(lazy);
        created.push(lazy);
      }
    }
    todo = created;
  }
  for (const module of [...common.deps]) if (!keep.has(module)) common.deps.delete(module);
  // Expo names every shared module an entry of `__common`; those left it, and import() must not look for them there.
  common.entries = new Set(keep);
  for (const chunk of asyncChunks()) if (chunk.deps.size === 0) chunks.delete(chunk);
  refillChunksByPath(chunks, chunksByPath);
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
