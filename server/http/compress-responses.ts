import compression from 'compression';
import type { Request, RequestHandler, Response } from 'express';
import { constants } from 'node:zlib';

/**
 * Types that are compressed already, or are sent as files a maker saves: a PDF kit is deflated
 * stream by stream by the PDF writer, photos are JPEG or WebP, archives are ZIP. Compressing them
 * again costs time for a few bytes.
 */
const ALREADY_COMPACT = /^(application\/(pdf|zip|octet-stream)|image\/(jpeg|png|webp|gif|avif)|font\/)/i;

/**
 * On-the-fly compression of what the server writes itself (JSON, SVG, HTML, CSV) with the
 * `compression` middleware (expressjs; brotli since 1.8): brotli when the client takes it, else
 * gzip. Brotli at quality 4 keeps the per-response cost near gzip's level 6 while it still beats
 * it on size (Google's brotli docs, from memory); precompressed assets set their own encoding and
 * are passed over.
 */
export function compressResponses(): RequestHandler {
  return compression({
    threshold: 1024,
    brotli: { params: { [constants.BROTLI_PARAM_QUALITY]: 4 } },
    filter: (req: Request, res: Response) => {
      const type = String(res.getHeader('Content-Type') ?? '');
      if (ALREADY_COMPACT.test(type)) return false;
      return compression.filter(req, res);
    },
  });
}
