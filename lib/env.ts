import { z } from "@/lib/validation/zod";

/**
 * The one place that reads process.env. Everything the server needs from its environment
 * is validated here; a missing or malformed value stops the server with a clear message.
 * scripts/start.sh and scripts/test.sh set these.
 */
const envSchema = z.object({
  DATABASE_URL: z.string().url(),
  AUTH_SECRET: z.string().min(32, "AUTH_SECRET must be at least 32 characters"),
  APP_URL: z.string().url().default("http://localhost:3000"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  MAIL_FROM: z.string().default("Ionleaf <notebook@ionleaf.invalid>"),
  /** Set only when mail goes to the local mail catcher; enables the in-app inbox page. */
  MAIL_CATCHER_URL: z.string().url().optional(),
  UPLOAD_DIR: z.string().default("uploads"),
  /** Where attachments are stored: the local disk (UPLOAD_DIR) or S3-compatible storage. */
  STORAGE_DRIVER: z.enum(["disk", "s3"]).default("disk"),
  S3_ENDPOINT: z.string().url().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_BUCKET: z.string().optional(),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_FORCE_PATH_STYLE: z
    .enum(["true", "false"])
    .default("true")
    .transform((v) => v === "true"),
  /** Largest attachment accepted, in bytes (200 MB). */
  UPLOAD_MAX_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(200 * 1024 * 1024),
  /** Comma-separated MIME types accepted as attachments (detected from the bytes). */
  UPLOAD_ALLOWED_TYPES: z
    .string()
    .default(
      "image/png,image/jpeg,image/webp,image/gif,image/tiff,application/pdf,text/plain,text/csv,application/zip",
    )
    .transform((v) =>
      v
        .split(",")
        .map((t) => t.trim())
        .filter(Boolean),
    ),
  /** Debian's Chromium, for PDF exports. */
  CHROMIUM_PATH: z.string().default("/usr/bin/chromium"),
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | null = null;

export function getEnv(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (parsed.success && parsed.data.STORAGE_DRIVER === "s3") {
    const missing = ["S3_BUCKET", "S3_ACCESS_KEY_ID", "S3_SECRET_ACCESS_KEY"].filter(
      (k) => !process.env[k],
    );
    if (missing.length)
      throw new Error(`Ionleaf is not configured: STORAGE_DRIVER=s3 needs ${missing.join(", ")}`);
  }
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Ionleaf is not configured: ${problems}`);
  }
  cached = parsed.data;
  return cached;
}
