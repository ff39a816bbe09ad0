import { z } from "zod";

// The server's environment, read and validated once, on first use (not at import time,
// so that `next build` does not need a database).
const serverEnvSchema = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  DATABASE_URL: z.string().url(),
  NEXTAUTH_SECRET: z.string().min(16, "NEXTAUTH_SECRET: must be at least 16 characters"),
  NEXTAUTH_URL: z.string().url(),
  /** Set when this instance runs as a demo or a test deployment (enables the development inbox). */
  GUYLINE_DEV_TOOLS: z
    .enum(["on", "off"])
    .default("off")
    .transform((value) => value === "on"),
});

export type ServerEnv = z.infer<typeof serverEnvSchema>;

let cached: ServerEnv | undefined;

export function serverEnv(): ServerEnv {
  if (!cached) {
    const parsed = serverEnvSchema.safeParse(process.env);
    if (!parsed.success) {
      const problems = parsed.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`);
      throw new Error(`Guyline's environment is incomplete:\n${problems.join("\n")}`);
    }
    cached = parsed.data;
  }
  return cached;
}
