import { defineConfig } from "drizzle-kit";

// `npm run db:generate` writes a new SQL migration under drizzle/ from db/schema.ts.
// It needs no database; `npm run db:migrate` (and npm start, and the tests) apply them.
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema.ts",
  out: "./drizzle",
});
