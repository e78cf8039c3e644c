// The package ships no types; only compress() is used (scripts/fonts-woff2.ts).
declare module "wawoff2" {
  const wawoff2: { compress(ttf: Uint8Array): Promise<Uint8Array> };
  export default wawoff2;
}
