import { fileTypeFromBuffer } from "file-type";
import { PHOTO_TYPES, type PhotoType } from "./photo-rules";

// What a photo is, read from its bytes: the name and the declared type come
// from whoever uploaded it and prove nothing.

/** file-type needs at most this many leading bytes for any format it knows. */
export const SNIFF_BYTES = 4100;

const ascii = (bytes: Uint8Array, from: number, text: string) => text.split("").every((c, i) => bytes[from + i] === c.charCodeAt(0));

// The container signatures, checked as well as file-type's answer so the
// three kinds we serve are pinned to their published definitions.
const SIGNATURE: Record<PhotoType, (b: Uint8Array) => boolean> = {
  // PNG signature, ISO/IEC 15948:2004 §5.2 (89 50 4E 47 0D 0A 1A 0A), from memory
  "image/png": (b) => [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a].every((v, i) => b[i] === v),
  // JPEG: SOI marker FF D8 then the next marker's FF, ITU-T T.81 (ISO/IEC 10918-1) Annex B, from memory
  "image/jpeg": (b) => b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff,
  // WebP: "RIFF" <size> "WEBP", the WebP container specification (RFC 9649), from memory
  "image/webp": (b) => ascii(b, 0, "RIFF") && ascii(b, 8, "WEBP"),
};

/** The photo type the bytes really are, or null when they are anything else. */
export async function photoKind(bytes: Uint8Array): Promise<PhotoType | null> {
  const found = await fileTypeFromBuffer(bytes.subarray(0, SNIFF_BYTES));
  const mime = found?.mime as PhotoType | undefined;
  if (!mime || !(PHOTO_TYPES as readonly string[]).includes(mime)) return null;
  return SIGNATURE[mime](bytes) ? mime : null;
}
