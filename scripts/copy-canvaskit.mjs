// CanvasKit's wasm must be served next to the web app; it is generated, never committed.
import { copyFileSync, existsSync, mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const src = join(root, 'node_modules/canvaskit-wasm/bin/full/canvaskit.wasm');
if (existsSync(src)) {
  mkdirSync(join(root, 'public'), { recursive: true });
  copyFileSync(src, join(root, 'public/canvaskit.wasm'));
}
