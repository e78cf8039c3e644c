// subset-font ships no types; the one call scripts/fonts-woff2.ts makes.
declare module "subset-font" {
  export default function subsetFont(
    font: Uint8Array,
    text: string,
    options?: { targetFormat?: "sfnt" | "woff" | "woff2" | "truetype" },
  ): Promise<Uint8Array>;
}
