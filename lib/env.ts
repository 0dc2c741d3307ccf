import { z } from "zod";

// Every setting the server reads, checked once so a typo fails at boot with a
// message that names the variable instead of surfacing later as a 500.
const envSchema = z.object({
  DATABASE_URL: z.string().url({ message: "DATABASE_URL must be a postgres:// URL" }),
  NEXTAUTH_SECRET: z.string().min(16, "NEXTAUTH_SECRET must be at least 16 characters"),
  NEXTAUTH_URL: z.string().url().optional(),
  APP_URL: z.string().url().default("http://127.0.0.1:3000"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  MAIL_API_URL: z.string().url().default("http://127.0.0.1:8025"),
  MAIL_FROM: z.string().default("Cantrove <no-reply@cantrove.test>"),
  UPLOADTHING_TOKEN: z.string().optional(),
  UPLOAD_ORIGIN: z.string().url({ message: "UPLOAD_ORIGIN must be a URL such as https://files.example.org" }).optional(),
  TILE_URL: z.string().default("/tiles/{z}/{x}/{y}.png"),
  TILE_ATTRIBUTION: z.string().default("Map: Larkhollow demo town data (Cantrove, invented), CC0"),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function env(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Cantrove cannot start: the environment is incomplete.\n${lines.join("\n")}`);
  }
  cached = parsed.data;
  return cached;
}
