// A local S3-compatible object store for tests and the two-server run (s3rver, from npm): objects
// under a folder, one bucket made at start. Never for real photos.
import S3rver from 's3rver';

/** Starts the fake on 127.0.0.1:port (0: any free port) with `bucket`; resolves to its env and close(). */
export async function startS3Fake({ dir, port = 0, bucket = 'cuffwright-photos' }) {
  const server = new S3rver({ address: '127.0.0.1', port, silent: true, directory: dir, configureBuckets: [{ name: bucket }] });
  const { port: bound } = await server.run();
  const endpoint = `http://127.0.0.1:${bound}`;
  return {
    endpoint,
    // s3rver accepts these fixed test credentials.
    env: { STORAGE: 's3', S3_BUCKET: bucket, S3_ENDPOINT: endpoint, S3_REGION: 'us-east-1', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' },
    close: () => server.close(),
  };
}
