import { mkdirSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import S3rver from 's3rver';
import { assertLoopback } from './loopback-http';

export type FakeS3Options = {
  port: number;
  /** Where objects are kept on disk. */
  directory: string;
  bucket: string;
  host?: string;
};

export type FakeS3 = { port: number; url: string; stop(): Promise<void> };

/**
 * An S3-compatible store on loopback (s3rver) with the photo bucket made, so the app's S3 SDK calls work
 * without a cloud account. s3rver checks request signatures with its fixed key pair, S3RVER / S3RVER.
 */
export async function startFakeS3(options: FakeS3Options): Promise<FakeS3> {
  const host = options.host ?? '127.0.0.1';
  assertLoopback(host);
  mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({
    port: options.port,
    address: host,
    directory: options.directory,
    silent: true,
    configureBuckets: [{ name: options.bucket, configs: [] }],
  });
  const address = (await server.run()) as AddressInfo;
  return {
    port: address.port,
    url: `http://${host}:${address.port}`,
    stop: () => server.close().then(() => undefined),
  };
}
