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
