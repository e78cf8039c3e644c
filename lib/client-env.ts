/**
 * Where the API lives, seen from the app: always the page's own origin. `npm start` serves the
 * exported app from the API's Express process, and `npm run dev` serves the API and passes the rest
 * to the Expo dev server, so the session cookie is same-origin in both. EXPO_PUBLIC_API_URL is
 * for a native build talking to a server elsewhere.
 */
export const apiBaseUrl: string =
  process.env.EXPO_PUBLIC_API_URL ?? (typeof window !== "undefined" ? window.location.origin : "http://127.0.0.1:8080");
