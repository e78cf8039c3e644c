import { z } from "zod";

/**
 * The web app runs under a Content-Security-Policy without 'unsafe-eval' (server/http/security-headers.ts).
 * zod compiles object checks with `new Function` when it may, and its probe for that is reported by the
 * browser as a policy violation even though zod catches the refusal; so the app tells zod not to try.
 * Imported first by the entry (index.ts), before any schema is built.
 */
z.config({ jitless: true });
