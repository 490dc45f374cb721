import { mkdirSync } from "node:fs";
import path from "node:path";
import S3rver from "s3rver";

export interface S3FakeOptions {
  port: number;
  directory: string;
}

export interface RunningFake {
  url: string;
  close(): Promise<void>;
}

/**
 * An S3-compatible server (s3rver) on 127.0.0.1, keeping objects as files in an ignored folder.
 * It accepts the fixed keys S3RVER / S3RVER; the app's bucket is created through the SDK at start.
 */
export async function startS3Fake({ port, directory }: S3FakeOptions): Promise<RunningFake> {
  const dir = path.resolve(directory);
  mkdirSync(dir, { recursive: true });
  const server = new S3rver({ address: "127.0.0.1", port, directory: dir, silent: true, vhostBuckets: false });
  try {
    await server.run();
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "EADDRINUSE") {
      throw new Error(
        `Port ${port} on 127.0.0.1 is already taken, so the S3 fake cannot ` +
          `start. Stop that program or change S3_ENDPOINT.`,
      );
    }
    throw error;
  }
  return { url: `http://127.0.0.1:${port}`, close: () => server.close() };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const port = Number(process.env.S3_FAKE_PORT ?? 9090);
  const fake = await startS3Fake({ port, directory: process.env.S3_FAKE_DIR ?? ".data/s3" });
  console.log(`S3 fake listening on ${fake.url}`);
  process.on("SIGINT", () => void fake.close().then(() => process.exit(0)));
}
