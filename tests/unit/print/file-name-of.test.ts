import { describe, expect, it } from 'vitest';
import { fileNameOf } from '../../../src/features/print/api/download-kit.ts';

describe('the file name of a download (Content-Disposition)', () => {
  it('reads the examples of RFC 6266, section 5', () => {
    expect(fileNameOf('Attachment; filename=example.html')).toBe('example.html');
    expect(fileNameOf('INLINE; FILENAME= "an example.html"')).toBe('an example.html');
    expect(fileNameOf('attachment; filename="an example.html"')).toBe('an example.html');
    // filename* wins where a client understands it (RFC 6266 section 4.3; RFC 8187 encoding).
    expect(fileNameOf("attachment; filename*= UTF-8''%e2%82%ac%20rates")).toBe('€ rates');
    expect(fileNameOf("attachment; filename*=UTF-8''%e2%82%ac%20rates")).toBe('€ rates');
    expect(fileNameOf('attachment; filename="EURO rates"; filename*=utf-8\'\'%e2%82%ac%20rates')).toBe('€ rates');
  });

  it('falls back to the plain name when filename* is malformed, and to nothing without a header', () => {
    expect(fileNameOf("attachment; filename=\"kit.pdf\"; filename*=UTF-8''%E2%82")).toBe('kit.pdf');
    expect(fileNameOf(null)).toBe(undefined);
  });
});
