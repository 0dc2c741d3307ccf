import { generateReactHelpers } from "@uploadthing/react";
import type { CantroveFileRouter } from "./file-router";

export const { useUploadThing } = generateReactHelpers<CantroveFileRouter>();

export const PHOTO_MAX_BYTES = 4 * 1024 * 1024;

/** Checked before anything is sent, with the same limits as the file route. */
export function photoProblem(file: File): string | null {
  if (!file.type.startsWith("image/")) return `“${file.name}” is not a picture. Choose a JPEG, PNG or WebP photo.`;
  if (file.size > PHOTO_MAX_BYTES) return `“${file.name}” is ${(file.size / 1024 / 1024).toFixed(1)} MB; photos can be at most 4 MB. Shrink it or pick another.`;
  return null;
}
