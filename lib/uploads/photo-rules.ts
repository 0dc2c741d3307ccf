// What counts as a photo, shared by the picker (client) and the server checks.
// No file-type import here: this file ends up in the browser bundle.

export const PHOTO_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type PhotoType = (typeof PHOTO_TYPES)[number];
export const PHOTO_EXTENSION: Record<PhotoType, string> = { "image/jpeg": "jpg", "image/png": "png", "image/webp": "webp" };
export const PHOTO_MAX_BYTES = 4 * 1024 * 1024;

export const NOT_A_PHOTO = "That file is not a JPEG, PNG or WebP photo, so it was not added. Choose a photo taken with a camera or phone.";

/** A filename safe in a Content-Disposition header: ASCII letters, digits, - and _, with the real extension. */
export function safeFileName(name: string, type: PhotoType | null): string {
  const stem = name
    .replace(/\.[^.]*$/, "")
    .normalize("NFKD")
    .replace(/\p{M}+/gu, "") // "é" keeps its "e"
    .replace(/[^A-Za-z0-9_-]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);
  return `${stem || "photo"}.${type ? PHOTO_EXTENSION[type] : "bin"}`;
}

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
