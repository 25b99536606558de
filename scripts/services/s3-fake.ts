import fs from "node:fs";
import S3rver from "s3rver";

export interface S3Fake {
  endpoint: string;
  close(): Promise<void>;
}

/** A local S3-compatible server on loopback, keeping objects in `directory`. */
export async function startS3Fake(port: number, directory: string, bucket: string): Promise<S3Fake> {
  fs.mkdirSync(directory, { recursive: true });
  const server = new S3rver({ address: "127.0.0.1", port, directory, silent: true, configureBuckets: [{ name: bucket, configs: [] }] });
  await server.run();
  return { endpoint: `http://127.0.0.1:${port}`, close: () => server.close() };
}
