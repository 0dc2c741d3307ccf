import { createHeaterHandler } from "@/lib/heaters/create";

export const dynamic = "force-dynamic";

export const POST = createHeaterHandler;
