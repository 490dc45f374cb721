"use client";

// Photos are redrawn in the browser before upload: the copy has the picture and nothing else, so the camera's hidden
// data (EXIF: where the photo was taken, the phone's serial number) never leaves the member's machine. Large photos
// are scaled to a long side of 2400 px, plenty to read a stamping and a tenth of the upload.
const LONG_SIDE = 2400;

export class PhotoReadError extends Error {}

export async function preparePhoto(file: File): Promise<Blob> {
  let bitmap: ImageBitmap;
  try {
    bitmap = await createImageBitmap(file, { imageOrientation: "from-image" });
  } catch {
    throw new PhotoReadError("This browser cannot read that photo. Save it as JPEG or PNG and try again.");
  }
  const scale = Math.min(1, LONG_SIDE / Math.max(bitmap.width, bitmap.height));
  const canvas = document.createElement("canvas");
  canvas.width = Math.round(bitmap.width * scale);
  canvas.height = Math.round(bitmap.height * scale);
  const context = canvas.getContext("2d");
  if (!context) throw new PhotoReadError("This browser cannot prepare photos for upload.");
  context.drawImage(bitmap, 0, 0, canvas.width, canvas.height);
  bitmap.close();
  const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/jpeg", 0.88));
  if (!blob) throw new PhotoReadError("This browser cannot prepare photos for upload.");
  return blob;
}
