import { z } from "zod";
import { localSessionSecret } from "./auth/local-secret";

/**
 * The one place that reads process.env. Everything else imports `env`.
 * The session secret must be set in production; elsewhere one is generated once and kept in
 * AUTH_SECRET_FILE, so restarts (and other servers on the same checkout) keep people signed in.
 */
const schema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  PORT: z.coerce.number().int().min(1).max(65535).default(8080),
  HOST: z.string().default("127.0.0.1"),
  DATABASE_URL: z.string().url().optional(),
  BETTER_AUTH_SECRET: z.string().min(32, "BETTER_AUTH_SECRET must be at least 32 characters").optional(),
  PUBLIC_URL: z.string().url().optional(),
  /** Where a generated session secret is kept when BETTER_AUTH_SECRET is unset (not in production). */
  AUTH_SECRET_FILE: z.string().default(".data/auth-secret"),
  /** The old photo folder (read by `npm run photos:to-object-store`); the local object store keeps its data under it. */
  UPLOAD_DIR: z.string().default("uploads"),
  /** The S3-compatible store for photos; unset, npm start, npm run dev and the tests start a local one. */
  S3_ENDPOINT: z.string().url().optional(),
  S3_BUCKET: z.string().min(3).default("casebook-photos"),
  S3_REGION: z.string().min(1).default("us-east-1"),
  /** Unset, the AWS SDK's usual chain (instance role, ~/.aws) supplies the keys. */
  S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
  /** Bucket in the path (`ENDPOINT/BUCKET/key`), which every S3-compatible store understands. */
  S3_FORCE_PATH_STYLE: z
    .enum(["true", "false"])
    .default("true")
    .transform((v) => v === "true"),
  /**
   * The photo store sweep (server/photos/orphan-sweep.ts) removes objects no row names only once they are
   * this old, so an upload another server is saving right now is never taken.
   */
  ORPHAN_PHOTO_GRACE_MINUTES: z.coerce.number().min(0).default(60),
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default("Shakeout Casebook <casebook@localhost>"),
  /** Where the local mail catcher writes .eml files; the development inbox page reads them from here. */
  MAIL_DIR: z.string().default(".data/mail"),
  /** The first wait before a failed send is tried again; later waits are 4x and 10x this. */
  MAIL_RETRY_MS: z.coerce.number().int().min(0).default(1000),
  /**
   * Whether X-Forwarded-For is believed, as Express's "trust proxy" reads it: "false" (the default: no
   * proxy, every address is the connecting socket's), "true", a hop count, or addresses such as
   * "loopback" or "10.0.0.0/8". Sign-in limits count by this address, so believe only a proxy you run.
   */
  TRUST_PROXY: z
    .string()
    .default("false")
    .transform((v): boolean | number | string =>
      v === "false" || v === "" ? false : v === "true" ? true : /^\d+$/.test(v) ? Number(v) : v,
    ),
  /** Limits on sign-in, sign-up, password reset and invitations; "off" only for load tests. */
  RATE_LIMIT: z.enum(["on", "off"], { error: "RATE_LIMIT is on or off" }).default("on"),
  /**
   * The casebook counts matches and chips over at most this many of the newest matching cases, so a
   * search costs the same in a shop of 1,000 cases as in one of 100,000 (server/search/service.ts).
   */
  SEARCH_COUNT_LIMIT: z.coerce.number().int().min(10).max(100_000).default(1000),
  /** Only for `npm run dev`: the Expo dev server's origin, allowed to call the API with cookies. */
  DEV_WEB_ORIGIN: z.string().url().optional(),
  /** Only for `npm run dev`: the Expo dev server that server/dev-server.ts passes non-API requests to. */
  METRO_URL: z.string().url().default("http://127.0.0.1:8081"),
});

type Env = z.infer<typeof schema> & { BETTER_AUTH_SECRET: string; PUBLIC_URL: string };
let cached: Env | undefined;

/** Reads and checks process.env on first use, then keeps the answer for the life of the process. */
export function loadEnv(): Env {
  if (cached) return cached;
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join("\n")}`);
  }
  const raw = parsed.data;
  if (raw.NODE_ENV === "production" && !raw.BETTER_AUTH_SECRET) {
    throw new Error("BETTER_AUTH_SECRET must be set in production (32+ random characters).");
  }
  cached = {
    ...raw,
    BETTER_AUTH_SECRET: raw.BETTER_AUTH_SECRET ?? localSessionSecret(raw.AUTH_SECRET_FILE),
    PUBLIC_URL: raw.PUBLIC_URL ?? `http://${raw.HOST}:${raw.PORT}`,
  };
  return cached;
}

/**
 * `env.X` reads through loadEnv(), so nothing reads process.env at import time: a script can set
 * DATABASE_URL (or PORT) and then use the server, whatever the order of its imports.
 */
export const env: Readonly<Env> = new Proxy({} as Env, {
  get: (_target, key) => loadEnv()[key as keyof Env],
});

export function requireDatabaseUrl(): string {
  if (!env.DATABASE_URL) throw new Error("DATABASE_URL is not set (npm start sets it for its local database).");
  return env.DATABASE_URL;
}

export function requireObjectStoreEndpoint(): string {
  if (!env.S3_ENDPOINT) {
    throw new Error("S3_ENDPOINT is not set (npm start, npm run dev and the tests start a local object store).");
  }
  return env.S3_ENDPOINT;
}
