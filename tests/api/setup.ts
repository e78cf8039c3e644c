import { inject } from "vitest";

// Runs in each test worker before any test module loads the app: point it at the test cluster.
process.env.DATABASE_URL = inject("databaseUrl");
process.env.NODE_ENV = "test";
process.env.PUBLIC_URL = "http://127.0.0.1:8080";
process.env.UPLOAD_DIR = `${process.env.TMPDIR ?? "/tmp"}/casebook-test-uploads-${process.pid}`;
