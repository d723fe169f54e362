import { benchBundle } from './bundle-bench.ts';
import { benchLayout } from './layout-bench.ts';
import { benchPdf } from './pdf-bench.ts';
import { benchPreview } from './preview-bench.ts';
import { benchRenderLoad } from './render-load-bench.ts';
import { benchTyping } from './typing-bench.ts';

/** npm run bench: speed and size figures (machine-dependent; compare runs on one machine). */
console.log(`Canwright benchmarks on Node ${process.version}`);
benchLayout();
await benchPdf();
await benchRenderLoad();
await benchBundle();
await benchPreview();
await benchTyping();
