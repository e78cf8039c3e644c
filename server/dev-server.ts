// `npm run dev`: one origin for the app and the API, so the session cookie goes back with every call.
// This process answers /api itself and passes every other request (and the reload websockets) on to
// the Expo (Metro) dev server at METRO_URL. tsx watch restarts it on every server change.
import express from "express";
import { createProxyMiddleware } from "http-proxy-middleware";
import { createApp } from "./app";
import { env } from "./env";

const metroUrl = env.METRO_URL;
const toMetro = createProxyMiddleware({ target: metroUrl, ws: true, changeOrigin: true });

const app = express();
app.use(createApp()); // /api and /api/auth; anything else falls through to the dev server
app.use(toMetro);

const server = app.listen(env.PORT, env.HOST, () => {
  console.log(`Shakeout Casebook (dev) at ${env.PUBLIC_URL} — the API under /api, the app from ${metroUrl}`);
});
server.on("upgrade", toMetro.upgrade);
server.on("error", (err) => {
  console.error(err.message);
  process.exit(1);
});
// tsx watch sends SIGTERM on restart and npm run dev sends it on Ctrl-C: free the port at once.
for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => {
    server.closeAllConnections();
    server.close(() => process.exit(0));
  });
}
