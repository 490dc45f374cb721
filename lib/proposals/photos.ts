import { randomBytes } from "node:crypto";
import { Op } from "sequelize";
import { sequelize, ProposalPhoto } from "@/db";
import { takeTurn } from "@/lib/concurrency/take-turn";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { PHOTO_MAX_BYTES, PHOTO_TYPES, type PhotoType } from "@/lib/proposals/kinds";
import { deleteObject, headObject, presignPut } from "@/lib/storage/s3";

const EXTENSIONS: Record<PhotoType, string> = { "image/jpeg": "jpg", "image/png": "png", "image/webp": "webp" };
const HOUR_MS = 60 * 60 * 1000;

export interface UploadGrant {
  photoId: number;
  uploadUrl: string;
  method: "PUT";
  headers: Record<string, string>;
  expiresInSeconds: number;
}

/**
 * Grants one photo upload: a row for the photo and a presigned PUT for exactly this type and size. The key is
 * 192 random bits, so nobody can reach a photo by guessing where it is stored.
 */
export async function grantUpload(
  userId: string,
  file: { contentType: PhotoType; size: number; fileName?: string },
): Promise<UploadGrant> {
  const key = `photos/${randomBytes(24).toString("base64url")}.${EXTENSIONS[file.contentType]}`;
  const expiresInSeconds = 600;
  const photo = await sequelize.transaction(async (transaction) => {
    await takeTurn(transaction, `upload:${userId}`);
    const recent = await ProposalPhoto.count({
      where: { userId, createdAt: { [Op.gt]: new Date(Date.now() - HOUR_MS) } },
      transaction,
    });
    if (recent >= env.UPLOADS_PER_HOUR) {
      throw new AppError(
        "rate_limited",
        `You have uploaded ${env.UPLOADS_PER_HOUR} photos in the last hour. Wait a while before adding more.`,
        { retryAfterSeconds: 3600 },
      );
    }
    return ProposalPhoto.create(
      {
        userId,
        proposalId: null,
        objectKey: key,
        contentType: file.contentType,
        sizeBytes: file.size,
        fileName: file.fileName?.slice(0, 200) ?? null,
      },
      { transaction },
    );
  });
  const uploadUrl = await presignPut(key, file.contentType, file.size, expiresInSeconds);
  return {
    photoId: photo.id,
    uploadUrl,
    method: "PUT",
    headers: { "Content-Type": file.contentType },
    expiresInSeconds,
  };
}

export interface PhotoCheck {
  usable: number[];
  missing: number[];
}

/**
 * Which of the member's granted photos really are in storage, of an allowed type and size. A photo that is not
 * (the upload failed, or storage cannot be reached) is left out, and the caller says so; the text is saved anyway.
 */
export async function checkUploadedPhotos(
  userId: string,
  photoIds: number[],
  proposalId: number | null,
): Promise<PhotoCheck> {
  if (photoIds.length === 0) return { usable: [], missing: [] };
  const rows = await ProposalPhoto.findAll({ where: { id: photoIds, userId } });
  const foreign = photoIds.filter((id) => !rows.some((r) => r.id === id));
  if (foreign.length > 0)
    throw new AppError("validation_failed", "A photo in this proposal is not one you uploaded.", { field: "photoIds" });
  const usable: number[] = [];
  const missing: number[] = [];
  for (const row of rows) {
    if (row.proposalId !== null && row.proposalId !== proposalId) {
      throw new AppError("validation_failed", "A photo in this proposal belongs to another proposal.", {
        field: "photoIds",
      });
    }
    let stored: Awaited<ReturnType<typeof headObject>> = null;
    try {
      stored = await headObject(row.objectKey);
    } catch (error) {
      console.error("[understudy] photo storage could not be reached", error);
    }
    // What arrived must be what was granted: real S3 enforces the signed type and length, the local fake does not.
    const ok =
      stored !== null &&
      stored.size > 0 &&
      stored.size <= PHOTO_MAX_BYTES &&
      stored.size === row.sizeBytes &&
      stored.contentType === row.contentType &&
      (PHOTO_TYPES as readonly string[]).includes(stored.contentType ?? "");
    (ok ? usable : missing).push(row.id);
  }
  return { usable, missing };
}

/** Removes photos from storage; a failure is logged, never shown, since the rows are gone either way. */
export async function deleteStoredPhotos(keys: string[]): Promise<void> {
  for (const key of keys) {
    try {
      await deleteObject(key);
    } catch (error) {
      console.error("[understudy] could not delete a stored photo", key, error);
    }
  }
}

/**
 * Photos granted but never attached to a proposal (the member left the form) are deleted from storage and from the
 * database after a day. Run by `npm run jobs:sweep-photos`.
 */
export async function sweepAbandonedPhotos(olderThanHours = 24): Promise<number> {
  const abandoned = await ProposalPhoto.findAll({
    where: { proposalId: null, createdAt: { [Op.lt]: new Date(Date.now() - olderThanHours * 3_600_000) } },
  });
  if (abandoned.length === 0) return 0;
  await deleteStoredPhotos(abandoned.map((p) => p.objectKey));
  await ProposalPhoto.destroy({ where: { id: abandoned.map((p) => p.id), proposalId: null } });
  return abandoned.length;
}
