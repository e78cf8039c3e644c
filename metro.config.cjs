// Expo's Metro defaults, plus WOFF2 as an asset: the web app ships its fonts as WOFF2 (app/_layout.tsx).
const { getDefaultConfig } = require("expo/metro-config");

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push("woff2");
module.exports = config;
