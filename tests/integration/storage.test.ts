import { randomBytes, randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { deleteObject, getObject, putObject } from "@/lib/storage/s3";

describe("object storage through the S3 SDK", () => {
  it("stores, reads back byte for byte and deletes an object", async () => {
    const key = `tests/${randomUUID()}.bin`;
    const body = new Uint8Array(randomBytes(300_000));
    await putObject(key, body, "application/octet-stream");

    const stored = await getObject(key);
    expect(stored.contentType).toBe("application/octet-stream");
    expect(Buffer.from(stored.body).equals(Buffer.from(body))).toBe(true);

    await deleteObject(key);
    await expect(getObject(key)).rejects.toThrow();
  });
});
