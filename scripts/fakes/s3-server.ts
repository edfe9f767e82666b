import S3rver from "s3rver";

/**
 * The local fake S3 store for development and tests (s3rver: the S3 REST API over files in a
 * folder), on loopback only, with the photo bucket already made. Its credentials are s3rver's
 * built-in pair; they open nothing but this fake.
 */
export async function startFakeS3(opts: { port: number; directory: string; bucket: string }) {
  const server = new S3rver({ address: "127.0.0.1", port: opts.port, directory: opts.directory, silent: true, configureBuckets: [{ name: opts.bucket, configs: [] }] });
  await server.run();
  return server;
}
