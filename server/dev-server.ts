// The API alone, for `npm run dev` (tsx watch restarts it on every change).
import { env } from "./env";
import { listen } from "./index";

await listen({ port: env.PORT, host: env.HOST });
console.log(`API listening on ${env.PUBLIC_URL}/api`);
