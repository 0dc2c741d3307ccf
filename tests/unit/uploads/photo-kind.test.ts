import { describe, expect, it } from "vitest";
import { photoKind } from "@/lib/uploads/photo-kind";
import { safeFileName } from "@/lib/uploads/photo-rules";
import { isUploadFileUrl, uploadFileOrigins, uploadOrigins } from "@/lib/uploads/origins";
import { SCRIPTED_SVG, TEXT_AS_PNG, jpegBytes, pngBytes, webpBytes } from "@/tests/support/images";

describe("photoKind reads the bytes", () => {
  it("knows real PNG, JPEG and WebP files from their encoders", async () => {
    const png = pngBytes();
    // PNG signature, ISO/IEC 15948 §5.2 (from memory)
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(await photoKind(png)).toBe("image/png");
    const jpeg = await jpegBytes();
    // JPEG SOI marker FF D8 then a marker FF, ITU-T T.81 Annex B (from memory)
    expect([...jpeg.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]);
    expect(await photoKind(jpeg)).toBe("image/jpeg");
    const webp = await webpBytes();
    // "RIFF" <size> "WEBP", the WebP container specification (RFC 9649, from memory)
    expect(webp.subarray(0, 4).toString("latin1")).toBe("RIFF");
    expect(webp.subarray(8, 12).toString("latin1")).toBe("WEBP");
    expect(await photoKind(webp)).toBe("image/webp");
  });

  it("refuses an SVG, text, other images and other RIFF files whatever they are called", async () => {
    expect(await photoKind(SCRIPTED_SVG)).toBeNull();
    expect(await photoKind(TEXT_AS_PNG)).toBeNull();
    expect(await photoKind(new Uint8Array(68))).toBeNull();
    expect(await photoKind(Buffer.from("GIF89a\x01\x00\x01\x00\x00\x00\x00;", "latin1"))).toBeNull();
    // A WAVE file shares the RIFF container but is no photo.
    expect(await photoKind(Buffer.concat([Buffer.from("RIFF"), Buffer.alloc(4), Buffer.from("WAVEfmt "), Buffer.alloc(32)]))).toBeNull();
    // An HTML page that begins with a PNG-looking line but is not one.
    expect(await photoKind(Buffer.from("\x89PNG<html><script>alert(1)</script>", "latin1"))).toBeNull();
  });
});

describe("safeFileName", () => {
  it("keeps a plain ASCII stem and the real extension", () => {
    expect(safeFileName("Porch photo (1).JPG", "image/jpeg")).toBe("Porch-photo-1.jpg");
    expect(safeFileName('x";\r\nSet-Cookie: a=b.png', "image/png")).toBe("x-Set-Cookie-a-b.png");
    expect(safeFileName("évier.svg", null)).toBe("evier.bin");
    expect(safeFileName("...", "image/webp")).toBe("photo.webp");
  });
});

describe("upload origins", () => {
  const local = { UPLOADTHING_INGEST_URL: "http://127.0.0.1:8026", UPLOADTHING_TOKEN: btoa(JSON.stringify({ apiKey: "sk_x", appId: "app1", regions: ["r"] })) };

  it("uses UPLOAD_ORIGIN when set, else the upload service's own origin, else the hosted file host", () => {
    expect(uploadFileOrigins({ ...local, UPLOAD_ORIGIN: "https://files.example.org/ignored/path" })).toEqual(["https://files.example.org"]);
    expect(uploadFileOrigins(local)).toEqual(["http://127.0.0.1:8026"]);
    expect(uploadFileOrigins({ UPLOADTHING_TOKEN: local.UPLOADTHING_TOKEN })).toEqual(["https://app1.ufs.sh"]);
    expect(uploadFileOrigins({ UPLOAD_ORIGIN: "javascript:alert(1)" })).toEqual([]);
  });

  it("gives the CSP its image and connect sources", () => {
    expect(uploadOrigins({ ...local, UPLOAD_ORIGIN: "http://localhost:8026" })).toEqual({
      img: ["http://localhost:8026"],
      connect: ["http://127.0.0.1:8026", "http://localhost:8026"],
    });
  });

  it("accepts a reported file URL only on a file origin", () => {
    const env = { ...local, UPLOAD_ORIGIN: "http://localhost:8026" };
    expect(isUploadFileUrl("http://localhost:8026/f/abc", env)).toBe(true);
    expect(isUploadFileUrl("http://127.0.0.1:8026/f/abc", env)).toBe(false);
    expect(isUploadFileUrl("http://localhost:5432/f/abc", env)).toBe(false);
    expect(isUploadFileUrl("file:///etc/passwd", env)).toBe(false);
    expect(isUploadFileUrl("not a url", env)).toBe(false);
  });
});
