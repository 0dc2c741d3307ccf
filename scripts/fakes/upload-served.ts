import { photoKind } from "../../lib/uploads/photo-kind";
import { safeFileName } from "../../lib/uploads/photo-rules";

// How the local upload service serves a stored file: inert whatever it is.
/** Headers for serving a stored file, decided by its bytes, never by its declared type or name. */
export async function servedHeaders(bytes: Uint8Array, name: string): Promise<Record<string, string>> {
  const type = await photoKind(bytes);
  const filename = safeFileName(name, type);
  return {
    "content-type": type ?? "application/octet-stream",
    "content-disposition": `${type ? "inline" : "attachment"}; filename="${filename}"`,
    "x-content-type-options": "nosniff",
    "content-security-policy": "default-src 'none'; img-src 'self'; sandbox",
    "cross-origin-resource-policy": "cross-origin",
    "cache-control": "public, max-age=31536000, immutable",
  };
}
