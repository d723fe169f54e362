import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';
import type { StorageTarget } from '../../server/storage/object-store.ts';

/**
 * A fake S3 server on loopback for the tests (s3rver: a long-kept fake of the S3 API that runs in
 * Node, so the tests need no Docker or network), with one empty bucket.
 */
export async function startFakeS3(): Promise<{ target: StorageTarget; keys(): Promise<string[]>; close(): Promise<void> }> {
  const directory = mkdtempSync(join(tmpdir(), 'canwright-s3-'));
  const bucket = 'canwright-test';
  const server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory, configureBuckets: [{ name: bucket }] });
  const { port } = await server.run();
  const endpoint = `http://127.0.0.1:${port}`;
  const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
  const client = new S3Client({ region: 'us-east-1', endpoint, forcePathStyle: true, credentials });
  return {
    target: { kind: 's3', bucket, prefix: 'canwright', endpoint, credentials },
    async keys() {
      const listed = await client.send(new ListObjectsV2Command({ Bucket: bucket }));
      return (listed.Contents ?? []).map((object) => object.Key!).sort();
    },
    async close() {
      client.destroy();
      await server.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
