import "server-only";
import { UTApi } from "uploadthing/server";
import { isUploadFileUrl } from "./origins";
import { SNIFF_BYTES, photoKind } from "./photo-kind";
import { NOT_A_PHOTO, PHOTO_MAX_BYTES, type PhotoType } from "./photo-rules";

export type UploadVerdict = { ok: true; type: PhotoType } | { ok: false; message: string };

interface ReportedFile {
  key: string;
  ufsUrl: string;
  size: number;
}

/** The first SNIFF_BYTES bytes of a stored file, read from the upload service. */
async function leadingBytes(url: string): Promise<Uint8Array> {
  const res = await fetch(url, {
    headers: { range: `bytes=0-${SNIFF_BYTES - 1}` },
    redirect: "error",
    signal: AbortSignal.timeout(10_000),
  });
  if (!res.ok || !res.body) throw new Error(`the upload service answered ${res.status}`);
  const reader = res.body.getReader();
  const chunks: Uint8Array[] = [];
  let length = 0;
  while (length < SNIFF_BYTES) {
    const { done, value } = await reader.read();
    if (done) break;
    chunks.push(value);
    length += value.length;
  }
  await reader.cancel().catch(() => undefined);
  const bytes = new Uint8Array(length);
  let at = 0;
  for (const c of chunks) {
    bytes.set(c, at);
    at += c.length;
  }
  return bytes.subarray(0, SNIFF_BYTES);
}

async function judge(file: ReportedFile): Promise<UploadVerdict> {
  // The callback is signed, but the URL is still only fetched from our own file host.
  if (!isUploadFileUrl(file.ufsUrl)) return { ok: false, message: "The photo could not be checked, so it was not added. Please try again." };
  if (file.size > PHOTO_MAX_BYTES) return { ok: false, message: "That photo is larger than 4 MB, so it was not added. Shrink it or pick another." };
  let bytes: Uint8Array;
  try {
    bytes = await leadingBytes(file.ufsUrl);
  } catch {
    return { ok: false, message: "The photo could not be checked, so it was not added. Please try again." };
  }
  const type = await photoKind(bytes);
  return type ? { ok: true, type } : { ok: false, message: NOT_A_PHOTO };
}

/**
 * Called when the upload service reports a stored file: decides by the file's
 * own bytes, and removes anything refused from the service so it is never served.
 */
export async function verifyUploadedPhoto(file: ReportedFile): Promise<UploadVerdict> {
  const verdict = await judge(file);
  if (!verdict.ok) {
    try {
      await new UTApi().deleteFiles(file.key);
    } catch (error) {
      // It stays on the service unrecorded and served inert (nosniff, sandbox), so the refusal still stands.
      console.error(`[uploads] could not delete refused file ${file.key}:`, (error as Error).message);
    }
  }
  return verdict;
}
