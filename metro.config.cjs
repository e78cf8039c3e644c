// Expo's Metro defaults, plus WOFF2 as an asset (the web app ships its fonts as WOFF2, app/_layout.tsx),
// plus zod in English only.
const path = require("node:path");
const { getDefaultConfig } = require("expo/metro-config");

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push("woff2");

// zod's entry re-exports every one of its 50 message languages as a namespace (`z.locales`), and Metro
// cannot drop the unused parts of a namespace: 270 KB of the web app's JavaScript (60 KB brotli) was
// messages in languages the app never shows. The app's messages are its own words, and zod's English
// is the default it registers itself (zod/v4/classic/schemas.js imports locales/en.js directly), so the
// web bundle gets a locales index with English alone. The server keeps the whole package.
const ZOD_LOCALES_INDEX = /[\\/]node_modules[\\/]zod[\\/]v4[\\/](core|classic)[\\/]/;
const englishOnly = path.join(__dirname, "lib", "zod-locales-english.ts");
config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (moduleName === "../locales/index.js" && ZOD_LOCALES_INDEX.test(context.originModulePath))
    return { type: "sourceFile", filePath: englishOnly };
  return context.resolveRequest(context, moduleName, platform);
};
module.exports = config;
