// The app's entry: zod is told not to compile with `new Function` before any schema is built
// (lib/zod-without-eval.ts), then Expo Router starts as its own entry would.
import "./lib/zod-without-eval";
import "expo-router/entry";
