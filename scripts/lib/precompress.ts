import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

// Text and wasm shrink well; images and fonts in woff2 are already compressed.
const COMPRESSIBLE = new Set(['.js', '.css', '.html', '.json', '.webmanifest', '.svg', '.txt', '.map', '.wasm', '.ttf']);
// Scripts, styles and pages get brotli's best; fonts and wasm a quicker setting that saves nearly as much.
const BEST = new Set(['.js', '.css', '.html', '.json', '.webmanifest', '.svg']);
// Below this a compressed copy saves less than the header it costs.
const MIN_BYTES = 1024;

function* walk(dir: string): Generator<string> {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* walk(full);
    else yield full;
  }
}

/** Writes `file.br` and `file.gz` beside every compressible file of the built app; returns how many files. */
export function precompress(dist: string): number {
  let count = 0;
  for (const file of walk(dist)) {
    if (!COMPRESSIBLE.has(path.extname(file)) || fs.statSync(file).size < MIN_BYTES) continue;
    const data = fs.readFileSync(file);
    fs.writeFileSync(
      `${file}.br`,
      zlib.brotliCompressSync(data, {
        params: {
          [zlib.constants.BROTLI_PARAM_QUALITY]: BEST.has(path.extname(file)) ? zlib.constants.BROTLI_MAX_QUALITY : 9,
          [zlib.constants.BROTLI_PARAM_SIZE_HINT]: data.length,
        },
      }),
    );
    fs.writeFileSync(`${file}.gz`, zlib.gzipSync(data, { level: zlib.constants.Z_BEST_COMPRESSION }));
    count += 1;
  }
  return count;
}
