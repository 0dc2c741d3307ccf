import "server-only";
import { createUploadthing, type FileRouter } from "uploadthing/next";
import { UploadThingError } from "uploadthing/server";
import { z } from "zod";
import { getActor } from "@/lib/auth/session";
import { db } from "@/lib/db";
import { forgetEverywhere } from "@/lib/cache/broadcast";
import { verifyUploadedPhoto } from "./verify-upload";

const f = createUploadthing();

// Only these three declared types get an upload URL at all; what the file
// really is is decided from its bytes when the upload service reports it.
const photoOnly = {
  "image/jpeg": { maxFileSize: "4MB", maxFileCount: 1 },
  "image/png": { maxFileSize: "4MB", maxFileCount: 1 },
  "image/webp": { maxFileSize: "4MB", maxFileCount: 1 },
} as const;

// Each type has its own count, so one request could otherwise carry three photos.
function onePhoto(files: readonly unknown[]) {
  if (files.length !== 1) throw new UploadThingError({ code: "BAD_REQUEST", message: "Send one photo at a time." });
}

// Photos of drop points: organisers only, images only, 4 MB at most. The row
// in `files` is written when the upload service confirms the upload and the
// bytes are a photo; anything else is deleted from the service.
export const fileRouter = {
  dropPointPhoto: f(photoOnly)
    .input(z.object({ dropPointId: z.string().uuid() }))
    .middleware(async ({ input, files }) => {
      const actor = await getActor();
      if (!actor) throw new UploadThingError({ code: "FORBIDDEN", message: "Sign in to upload photos." });
      if (actor.role !== "organiser") throw new UploadThingError({ code: "FORBIDDEN", message: "Only organisers add drop point photos." });
      onePhoto(files);
      const point = await db("drop_points").select("id").where({ id: input.dropPointId, group_id: actor.group.id }).first();
      if (!point) throw new UploadThingError({ code: "NOT_FOUND", message: "That drop point was not found." });
      return { groupId: actor.group.id, userId: actor.user.id, dropPointId: point.id as string };
    })
    .onUploadComplete(async ({ metadata, file }) => {
      const verdict = await verifyUploadedPhoto(file);
      if (!verdict.ok) return { refused: verdict.message };
      await db("files")
        .insert({
          group_id: metadata.groupId,
          uploaded_by: metadata.userId,
          key: file.key,
          url: file.ufsUrl,
          name: file.name.slice(0, 240),
          size: file.size,
          mime: verdict.type,
          purpose: "drop-point-photo",
          subject_id: metadata.dropPointId,
        })
        .onConflict("key")
        .ignore();
      await forgetEverywhere();
      return { url: file.ufsUrl };
    }),
  // A photo with a "this bin is full" report: anyone may add one, but only to a
  // report made in the last 15 minutes that has no photo yet.
  fillReportPhoto: f(photoOnly)
    .input(z.object({ fillReportId: z.string().uuid() }))
    .middleware(async ({ input, files }) => {
      onePhoto(files);
      const report = await db("fill_reports as f")
        .join("drop_points as p", "p.id", "f.drop_point_id")
        .join("drives as d", "d.id", "p.drive_id")
        .select("f.id", "f.group_id")
        .where({ "f.id": input.fillReportId, "d.is_public": true })
        .whereNull("f.photo_file_id")
        .andWhere("f.created_at", ">", db.raw("now() - interval '15 minutes'"))
        .first();
      if (!report) throw new UploadThingError({ code: "NOT_FOUND", message: "That report cannot take a photo any more; send a new report." });
      return { groupId: report.group_id as string, fillReportId: report.id as string };
    })
    .onUploadComplete(async ({ metadata, file }) => {
      const verdict = await verifyUploadedPhoto(file);
      if (!verdict.ok) return { refused: verdict.message };
      const [row] = await db("files")
        .insert({
          group_id: metadata.groupId,
          key: file.key,
          url: file.ufsUrl,
          name: file.name.slice(0, 240),
          size: file.size,
          mime: verdict.type,
          purpose: "fill-report-photo",
          subject_id: metadata.fillReportId,
        })
        .onConflict("key")
        .ignore()
        .returning("id");
      if (row) await db("fill_reports").where({ id: metadata.fillReportId }).whereNull("photo_file_id").update({ photo_file_id: row.id });
      await forgetEverywhere();
      return { url: file.ufsUrl };
    }),
} satisfies FileRouter;

export type CantroveFileRouter = typeof fileRouter;
