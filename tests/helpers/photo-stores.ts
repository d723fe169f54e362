import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import type { StorageTarget } from '../../server/storage/object-store.ts';
import { startFakeS3 } from './fake-s3.ts';

export interface OpenStore {
  target: StorageTarget;
  /** Every stored object's key, sorted. */
  keys(): Promise<string[]>;
  close(): Promise<void>;
}

/** A store of files in a fresh folder, listed by walking it. */
export async function openDiskStore(): Promise<OpenStore> {
  const dir = mkdtempSync(join(tmpdir(), 'canwright-photos-'));
  const list = (at: string): string[] => readdirSync(at, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? list(join(at, e.name)) : [relative(dir, join(at, e.name))]));
  return { target: { kind: 'disk', dir }, keys: async () => list(dir).sort(), close: async () => rmSync(dir, { recursive: true, force: true }) };
}

/** Both stores the app has, for describe.each: files in a folder, and S3 through a fake S3 server on loopback. */
export const photoStores = [
  { name: 'files in a folder', open: openDiskStore },
  { name: 'S3 (a fake S3 server on loopback)', open: startFakeS3 as () => Promise<OpenStore> },
];
