import { createCanvas } from "@napi-rs/canvas";
import { PNG } from "pngjs";

// Small real images for upload tests, encoded by real encoders (pngjs for
// PNG, Skia through @napi-rs/canvas for JPEG and WebP), plus files that only
// pretend to be images.

export function pngBytes(size = 8): Buffer {
  const png = new PNG({ width: size, height: size });
  for (let i = 0; i < png.data.length; i += 4) png.data.set([200, 100, 40, 255], i);
  return PNG.sync.write(png);
}

function canvas(size: number) {
  const c = createCanvas(size, size);
  const ctx = c.getContext("2d");
  ctx.fillStyle = "#c8642a";
  ctx.fillRect(0, 0, size, size);
  return c;
}

export const jpegBytes = (size = 8): Promise<Buffer> => canvas(size).encode("jpeg", 80);
export const webpBytes = (size = 8): Promise<Buffer> => canvas(size).encode("webp", 80);

/** An SVG whose script would post to the app if a browser ran it as a page. */
export const SCRIPTED_SVG = Buffer.from(
  `<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>fetch("/api/invitations",{method:"POST",credentials:"include",body:JSON.stringify({email:"x@evil.example",role:"organiser"})})</script><rect width="10" height="10"/></svg>`,
);

/** 13 bytes of text, the size of the renamed file in the finding. */
export const TEXT_AS_PNG = Buffer.from("not an image\n");
