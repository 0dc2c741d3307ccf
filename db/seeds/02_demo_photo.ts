import type { Knex } from "knex";
import { PNG } from "pngjs";
import { UTApi, UTFile } from "uploadthing/server";

// One drop-point photo uploaded through the upload service, so the demo shows
// a real stored file. The picture is drawn here: a green bin under a porch.
function drawBinPicture(): Buffer {
  const png = new PNG({ width: 320, height: 240 });
  for (let y = 0; y < 240; y++) {
    for (let x = 0; x < 320; x++) {
      const i = (y * 320 + x) * 4;
      let rgb = y < 150 ? [236, 226, 208] : [168, 150, 122]; // wall, pavement
      if (y > 30 && y < 46 && x > 40 && x < 280) rgb = [127, 48, 17]; // porch beam
      if (x > 110 && x < 210 && y > 80 && y < 200) rgb = [47, 106, 74]; // bin body
      if (x > 100 && x < 220 && y > 70 && y <= 80) rgb = [32, 74, 51]; // bin lid
      if (x > 140 && x < 180 && y > 110 && y < 150 && (x + y) % 9 < 5) rgb = [251, 247, 240]; // can sign
      png.data.set([...rgb, 255], i);
    }
  }
  return PNG.sync.write(png);
}

export async function seed(knex: Knex): Promise<void> {
  if (!process.env.UPLOADTHING_TOKEN) return;
  const point = await knex("drop_points").where({ name: "Larkhollow Library porch" }).first();
  if (!point) return;
  const api = new UTApi();
  const file = new UTFile([new Uint8Array(drawBinPicture())], "library-porch-bin.png", { type: "image/png" });
  const [result] = await api.uploadFiles([file]);
  if (!result || result.error || !result.data) {
    console.warn("Demo photo not uploaded:", result?.error?.message ?? "no answer from the upload service");
    return;
  }
  await knex("files").insert({
    group_id: point.group_id,
    key: result.data.key,
    url: result.data.ufsUrl,
    name: result.data.name,
    size: result.data.size,
    mime: "image/png",
    purpose: "drop-point-photo",
    subject_id: point.id,
  });
}
