/**
 * Where the API lives, seen from the app. The exported web app is served by the API's own
 * Express process, so the page's origin is right; the Expo dev server (port 8081) is told
 * the API's address through EXPO_PUBLIC_API_URL (npm run dev sets it).
 */
export const apiBaseUrl: string =
  process.env.EXPO_PUBLIC_API_URL ?? (typeof window !== "undefined" ? window.location.origin : "http://127.0.0.1:8080");
