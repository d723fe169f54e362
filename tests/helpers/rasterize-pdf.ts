import { writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { createCanvas } from '@napi-rs/canvas';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import type { PDFDocumentProxy } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { PNG } from 'pngjs';

/** A rendered page: RGBA, row-major, top row first; pixel i spans [i, i + 1) at dpi / 25.4 px a mm. */
export interface RasterImage {
  width: number;
  height: number;
  data: Uint8ClampedArray;
}

/** pdf.js's own data folders, as file URLs with the trailing slash it expects. */
const pdfjsRoot = dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json'));
const folderUrl = (name: string): string => `${pathToFileURL(join(pdfjsRoot, name)).href}/`;

async function openPdf(bytes: Uint8Array): Promise<PDFDocumentProxy> {
  // pdf.js may transfer the buffer it is given to its (fake) worker: hand it a copy.
  return getDocument({
    data: bytes.slice(),
    standardFontDataUrl: folderUrl('standard_fonts'),
    wasmUrl: folderUrl('wasm'),
    // Glyphs drawn as paths from the embedded font, as a printer driver would.
    disableFontFace: true,
    isEvalSupported: false,
    verbosity: 0,
  }).promise;
}

export async function pageCount(bytes: Uint8Array): Promise<number> {
  const pdf = await openPdf(bytes);
  try {
    return pdf.numPages;
  } finally {
    await pdf.destroy();
  }
}

/** Renders one page (1-based) at `dpi` on white, the way it would print. */
export async function rasterizePdf(bytes: Uint8Array, options: { dpi: number; page: number }): Promise<RasterImage> {
  const pdf = await openPdf(bytes);
  try {
    const page = await pdf.getPage(options.page);
    // PDF user space is 72 units an inch (ISO 32000-1, 8.3.2.3).
    const viewport = page.getViewport({ scale: options.dpi / 72 });
    const width = Math.round(viewport.width);
    const height = Math.round(viewport.height);
    const canvas = createCanvas(width, height);
    const context = canvas.getContext('2d');
    // @napi-rs/canvas stands in for the DOM canvas pdf.js types expect.
    await page.render({ canvas: null, canvasContext: context as unknown as CanvasRenderingContext2D, viewport }).promise;
    const { data } = context.getImageData(0, 0, width, height);
    return { width, height, data: new Uint8ClampedArray(data.buffer, data.byteOffset, data.byteLength) };
  } finally {
    await pdf.destroy();
  }
}

/** Writes an image, or only `crop` of it (pixels), as PNG: a whole 600 dpi page is slow to encode. */
export async function savePng(
  image: RasterImage,
  path: string,
  crop: { x: number; y: number; width: number; height: number } = { x: 0, y: 0, width: image.width, height: image.height },
): Promise<void> {
  const x0 = Math.max(0, Math.floor(crop.x));
  const y0 = Math.max(0, Math.floor(crop.y));
  const width = Math.min(image.width, Math.floor(crop.x + crop.width)) - x0;
  const height = Math.min(image.height, Math.floor(crop.y + crop.height)) - y0;
  if (width <= 0 || height <= 0) throw new Error('Crop is outside the image');
  const png = new PNG({ width, height });
  for (let row = 0; row < height; row++) {
    const from = ((y0 + row) * image.width + x0) * 4;
    png.data.set(image.data.subarray(from, from + width * 4), row * width * 4);
  }
  await writeFile(path, PNG.sync.write(png));
}

/** The text of every page, items joined by spaces, as pdf.js reads it back from the file. */
export async function readPdfText(bytes: Uint8Array): Promise<string[]> {
  const pdf = await openPdf(bytes);
  try {
    const pages: string[] = [];
    for (let n = 1; n <= pdf.numPages; n++) {
      const content = await (await pdf.getPage(n)).getTextContent();
      pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' ').replace(/\s+/g, ' '));
    }
    return pages;
  } finally {
    await pdf.destroy();
  }
}
