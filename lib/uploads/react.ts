import { generateReactHelpers } from "@uploadthing/react";
import type { CantroveFileRouter } from "./file-router";
import { PHOTO_MAX_BYTES, PHOTO_TYPES } from "./photo-rules";

export const { useUploadThing } = generateReactHelpers<CantroveFileRouter>();

export { PHOTO_MAX_BYTES };
/** For the file picker's `accept`. */
export const PHOTO_ACCEPT = PHOTO_TYPES.join(",");

/**
 * Checked before anything is sent, with the same limits as the file route. The
 * declared type is only a courtesy here: the server decides by the file's bytes.
 */
export function photoProblem(file: File): string | null {
  if (!(PHOTO_TYPES as readonly string[]).includes(file.type)) return `“${file.name}” is not a JPEG, PNG or WebP photo. Choose one of those.`;
  if (file.size > PHOTO_MAX_BYTES) return `“${file.name}” is ${(file.size / 1024 / 1024).toFixed(1)} MB; photos can be at most 4 MB. Shrink it or pick another.`;
  return null;
}

/** What the server said about an upload it received: null when the photo was taken. */
export function uploadRefusal(results: { serverData: unknown }[] | undefined): string | null {
  const data = results?.[0]?.serverData as { refused?: unknown } | null | undefined;
  if (!results?.length) return "The photo was not saved. Please try again.";
  return typeof data?.refused === "string" ? data.refused : null;
}
