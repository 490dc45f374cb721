"use client";

import { useEffect, useRef, useState } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { PHOTO_MAX_BYTES, PHOTO_TYPES, PHOTOS_PER_PROPOSAL } from "@/lib/proposals/kinds";
import type { UploadGrant } from "@/lib/proposals/photos";
import { sendJson } from "@/lib/http/post-json";
import { PhotoReadError, preparePhoto } from "@/lib/photos/prepare";

export interface PhotoItem {
  key: string;
  name: string;
  preview: string;
  status: "preparing" | "uploading" | "done" | "failed";
  photoId?: number;
  error?: string;
}

const MB = 1024 * 1024;

function rejectionText(r: FileRejection): string {
  const code = r.errors[0]?.code;
  if (code === "file-too-large") return `${r.file.name} is larger than ${PHOTO_MAX_BYTES / MB} MB.`;
  if (code === "file-invalid-type") return `${r.file.name} is not a photo: use JPEG, PNG or WebP.`;
  if (code === "too-many-files") return `At most ${PHOTOS_PER_PROPOSAL} photos.`;
  return `${r.file.name}: ${r.errors[0]?.message ?? "not accepted"}`;
}

/**
 * Photos dropped or chosen are redrawn in the browser (which strips the hidden camera data, location included),
 * then sent straight to storage with a presigned PUT. The form gets the ids of the photos that arrived.
 */
export function PhotoDrop({
  initial,
  onChange,
}: {
  initial: PhotoItem[];
  onChange: (photoIds: number[], busy: boolean) => void;
}) {
  const [items, setItems] = useState<PhotoItem[]>(initial);
  const [refused, setRefused] = useState<string[]>([]);
  const onChangeRef = useRef(onChange);
  useEffect(() => {
    onChangeRef.current = onChange;
  }, [onChange]);

  useEffect(() => {
    const done = items.filter((i) => i.status === "done" && i.photoId).map((i) => i.photoId!);
    onChangeRef.current(
      done,
      items.some((i) => i.status === "preparing" || i.status === "uploading"),
    );
  }, [items]);

  const update = (key: string, patch: Partial<PhotoItem>) =>
    setItems((all) => all.map((i) => (i.key === key ? { ...i, ...patch } : i)));

  async function upload(file: File, key: string) {
    try {
      const blob = await preparePhoto(file);
      update(key, { status: "uploading" });
      const grant = await sendJson<UploadGrant>("POST", "/api/uploads/presign", {
        contentType: "image/jpeg",
        size: blob.size,
        fileName: file.name.replace(/\.[^.]+$/, ".jpg"),
      });
      if (!grant.ok) return update(key, { status: "failed", error: grant.error.message });
      const put = await fetch(grant.data.uploadUrl, { method: "PUT", body: blob, headers: grant.data.headers }).catch(
        () => null,
      );
      if (!put?.ok)
        return update(key, {
          status: "failed",
          error: "The photo did not reach storage. Try again, or send the proposal without it.",
        });
      update(key, { status: "done", photoId: grant.data.photoId });
    } catch (error) {
      update(key, {
        status: "failed",
        error: error instanceof PhotoReadError ? error.message : "The photo could not be prepared.",
      });
    }
  }

  const room = PHOTOS_PER_PROPOSAL - items.filter((i) => i.status !== "failed").length;
  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    accept: Object.fromEntries(PHOTO_TYPES.map((t) => [t, []])),
    maxSize: PHOTO_MAX_BYTES,
    disabled: room <= 0,
    onDrop: (accepted, rejections) => {
      const taken = accepted.slice(0, Math.max(room, 0));
      const over = accepted
        .slice(Math.max(room, 0))
        .map((f) => `${f.name}: at most ${PHOTOS_PER_PROPOSAL} photos to a proposal.`);
      setRefused([...rejections.map(rejectionText), ...over]);
      const added = taken.map((file) => ({
        key: `${Date.now()}-${Math.random()}`,
        name: file.name,
        preview: URL.createObjectURL(file),
        status: "preparing" as const,
        file,
      }));
      setItems((all) => [...all, ...added.map(({ file: _file, ...item }) => item)]);
      for (const a of added) void upload(a.file, a.key);
    },
  });

  return (
    <div className="space-y-3">
      <div
        {...getRootProps({
          className: [
            "flex min-h-32 cursor-pointer flex-col items-center justify-center gap-1",
            "rounded-lg border-2 border-dashed p-4",
            "text-center",
            isDragActive ? "border-brass bg-brass-wash" : "border-rule-strong bg-ground-raised",
            room <= 0 ? "cursor-not-allowed opacity-60" : "",
          ].join(" "),
        })}
        data-testid="photo-drop"
      >
        <input {...getInputProps({ "aria-label": "Add photos" })} />
        <p className="font-bold">
          {room <= 0
            ? `${PHOTOS_PER_PROPOSAL} photos added: that is the most`
            : "Drop photos here, or click to choose them"}
        </p>
        <p className="text-sm text-ink-soft">
          Up to {PHOTOS_PER_PROPOSAL} photos, JPEG, PNG or WebP, {PHOTO_MAX_BYTES / MB} MB each. The stamping, the old
          and new part side by side, and the fitted part help most.
        </p>
        <p className="text-sm text-ink-soft">
          Photos are redrawn in your browser before upload, which removes the camera&apos;s hidden data, including where
          the photo was taken.
        </p>
      </div>
      {refused.length > 0 && (
        <ul className="space-y-1 text-sm font-bold text-caution" role="alert">
          {refused.map((r) => (
            <li key={r}>✕ {r}</li>
          ))}
        </ul>
      )}
      {items.length > 0 && (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3" aria-label="Photos">
          {items.map((item) => (
            <li
              key={item.key}
              className="space-y-1 rounded-md border border-rule bg-ground-raised p-2"
              data-testid="photo-item"
              data-status={item.status}
            >
              {/* eslint-disable-next-line @next/next/no-img-element -- a local preview of the member's own file */}
              <img
                src={item.preview}
                alt={`Photo ${item.name}`}
                className="aspect-square w-full rounded object-cover"
              />
              <p className="truncate text-sm" title={item.name}>
                {item.name}
              </p>
              <p className={`text-sm ${item.status === "failed" ? "font-bold text-caution" : "text-ink-soft"}`}>
                {
                  {
                    preparing: "Preparing…",
                    uploading: "Uploading…",
                    done: "Uploaded",
                    failed: item.error ?? "Failed",
                  }[item.status]
                }
              </p>
              <button
                type="button"
                className="text-sm underline"
                onClick={() => setItems((all) => all.filter((i) => i.key !== item.key))}
              >
                Remove
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
