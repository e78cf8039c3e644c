import { randomUUID } from "node:crypto";
import pg from "pg";
import { inject } from "vitest";
import { STAND_IN_KEYS } from "../../server/photos/stand-in-keys";
import { createBucket } from "./object-store";

// Runs before each test file, before it loads the app: a database of the file's own, cloned from
// the migrated template (CREATE DATABASE ... TEMPLATE copies it in well under a second), so test
// files in parallel workers never see each other's rows. The cluster is removed after the run.
const templateUrl = new URL(inject("templateUrl"));
const name = `casebook_${randomUUID().replaceAll("-", "").slice(0, 12)}`;
const admin = new pg.Client({ connectionString: new URL("/postgres", templateUrl).href });
await admin.connect();
for (let attempt = 1; ; attempt++) {
  try {
    await admin.query(`CREATE DATABASE ${name} TEMPLATE casebook_template`);
    break;
  } catch (err) {
    // Two clones starting at the same instant can see each other on the template; try again.
    if (attempt >= 5 || !/being accessed by other users/.test((err as Error).message)) throw err;
    await new Promise((r) => setTimeout(r, 200 * attempt));
  }
}
await admin.end();

process.env.DATABASE_URL = new URL(`/${name}`, templateUrl).href;
process.env.NODE_ENV = "test";
// Every test signs people up and in from one address; tests/api/rate-limit.test.ts turns the limits on.
process.env.RATE_LIMIT = "off";
process.env.PUBLIC_URL = "http://127.0.0.1:8080";
process.env.SMTP_URL = inject("smtpUrl");
process.env.MAIL_DIR = inject("mailDir");
// Each file its own uploads folder (the old photo layout) and its own bucket: photo tests count objects.
process.env.UPLOAD_DIR = `${process.env.TMPDIR ?? "/tmp"}/casebook-test-uploads-${name}`;
process.env.AUTH_SECRET_FILE = inject("authSecretFile");
const standIn = !process.env.S3_ENDPOINT;
process.env.S3_ENDPOINT = inject("s3Endpoint");
process.env.S3_BUCKET = name.replaceAll("_", "-");
if (standIn) {
  process.env.S3_ACCESS_KEY_ID = STAND_IN_KEYS.accessKeyId;
  process.env.S3_SECRET_ACCESS_KEY = STAND_IN_KEYS.secretAccessKey;
}
await createBucket(process.env.S3_ENDPOINT, process.env.S3_BUCKET, {
  accessKeyId: process.env.S3_ACCESS_KEY_ID!,
  secretAccessKey: process.env.S3_SECRET_ACCESS_KEY!,
});
