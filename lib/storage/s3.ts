import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  PutBucketCorsCommand,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { env, isProduction } from "@/lib/env";

let client: S3Client | undefined;

/** Everything reaches storage through this client; endpoint, bucket and keys come from the environment alone. */
export function storageClient(): S3Client {
  client ??= new S3Client({
    endpoint: env.S3_ENDPOINT || undefined,
    region: env.S3_REGION,
    forcePathStyle: env.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    // Checksums only where S3 requires them: the local fake stores streamed bodies wrongly otherwise,
    // and real S3 accepts either.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return client;
}

export async function ensureBucket(): Promise<void> {
  const s3 = storageClient();
  try {
    await s3.send(new HeadBucketCommand({ Bucket: env.S3_BUCKET }));
  } catch {
    await s3.send(new CreateBucketCommand({ Bucket: env.S3_BUCKET }));
  }
  // Photos go from the browser straight to the bucket with presigned PUTs, so the bucket must accept the app's origin.
  // Locally the app is reached as localhost or 127.0.0.1, so any origin is allowed there; the URLs are signed anyway.
  const origins = isProduction ? [new URL(env.APP_URL).origin] : ["*"];
  await s3.send(
    new PutBucketCorsCommand({
      Bucket: env.S3_BUCKET,
      CORSConfiguration: {
        CORSRules: [
          { AllowedOrigins: origins, AllowedMethods: ["PUT", "GET"], AllowedHeaders: ["*"], MaxAgeSeconds: 3600 },
        ],
      },
    }),
  );
}

export async function checkStorage(): Promise<void> {
  await storageClient().send(new HeadBucketCommand({ Bucket: env.S3_BUCKET }));
}

export async function putObject(key: string, body: Uint8Array | string, contentType: string): Promise<void> {
  await storageClient().send(
    new PutObjectCommand({ Bucket: env.S3_BUCKET, Key: key, Body: body, ContentType: contentType }),
  );
}

export async function getObject(key: string): Promise<{ body: Uint8Array; contentType: string | undefined }> {
  const result = await storageClient().send(new GetObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
  if (!result.Body) throw new Error(`Stored object ${key} has no body`);
  return { body: await result.Body.transformToByteArray(), contentType: result.ContentType };
}

export async function deleteObject(key: string): Promise<void> {
  await storageClient().send(new DeleteObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
}

/** A URL the browser can PUT one object to, for a few minutes, with exactly this type and size. */
export async function presignPut(
  key: string,
  contentType: string,
  size: number,
  expiresInSeconds = 600,
): Promise<string> {
  return getSignedUrl(
    storageClient(),
    new PutObjectCommand({ Bucket: env.S3_BUCKET, Key: key, ContentType: contentType, ContentLength: size }),
    {
      expiresIn: expiresInSeconds,
      signableHeaders: new Set(["content-type", "content-length"]),
    },
  );
}

/** The stored object's type and size, or null when nothing is stored under the key. */
export async function headObject(key: string): Promise<{ contentType: string | undefined; size: number } | null> {
  try {
    const result = await storageClient().send(new HeadObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
    return { contentType: result.ContentType, size: result.ContentLength ?? 0 };
  } catch (error) {
    const status = (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404) return null;
    throw error;
  }
}
