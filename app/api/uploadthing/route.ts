import { createRouteHandler } from "uploadthing/next";
import { fileRouter } from "@/lib/uploads/file-router";

export const { GET, POST } = createRouteHandler({ router: fileRouter });
