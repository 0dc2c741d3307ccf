import { generateReactHelpers } from "@uploadthing/react";
import type { CantroveFileRouter } from "./file-router";

export const { useUploadThing, uploadFiles } = generateReactHelpers<CantroveFileRouter>();

export { PHOTO_ACCEPT, PHOTO_MAX_BYTES, photoProblem } from "./photo-rules";

/** What the server said about an upload it received: null when the photo was taken. */
export function uploadRefusal(results: { serverData: unknown }[] | undefined): string | null {
  const data = results?.[0]?.serverData as { refused?: unknown } | null | undefined;
  if (!results?.length) return "The photo was not saved. Please try again.";
  return typeof data?.refused === "string" ? data.refused : null;
}
