import "server-only";
import { createUploadthing, type FileRouter } from "uploadthing/next";
import { UploadThingError } from "uploadthing/server";
import { z } from "zod";
import { getActor } from "@/lib/auth/session";
import { db } from "@/lib/db";

const f = createUploadthing();

// Photos of drop points: organisers only, images only, 4 MB at most. The row
// in `files` is written when the upload service confirms the upload.
export const fileRouter = {
  dropPointPhoto: f({ image: { maxFileSize: "4MB", maxFileCount: 1 } })
    .input(z.object({ dropPointId: z.string().uuid() }))
    .middleware(async ({ input }) => {
      const actor = await getActor();
      if (!actor) throw new UploadThingError({ code: "FORBIDDEN", message: "Sign in to upload photos." });
      if (actor.role !== "organiser") throw new UploadThingError({ code: "FORBIDDEN", message: "Only organisers add drop point photos." });
      const point = await db("drop_points").select("id").where({ id: input.dropPointId, group_id: actor.group.id }).first();
      if (!point) throw new UploadThingError({ code: "NOT_FOUND", message: "That drop point was not found." });
      return { groupId: actor.group.id, userId: actor.user.id, dropPointId: point.id as string };
    })
    .onUploadComplete(async ({ metadata, file }) => {
      await db("files")
        .insert({
          group_id: metadata.groupId,
          uploaded_by: metadata.userId,
          key: file.key,
          url: file.ufsUrl,
          name: file.name.slice(0, 240),
          size: file.size,
          mime: file.type,
          purpose: "drop-point-photo",
          subject_id: metadata.dropPointId,
        })
        .onConflict("key")
        .ignore();
      return { url: file.ufsUrl };
    }),
} satisfies FileRouter;

export type CantroveFileRouter = typeof fileRouter;
