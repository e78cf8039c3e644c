import sharp from "sharp";

/**
 * Illustrations for the demo shop, drawn by code: a grey casting on moulding sand with its defects
 * painted where the demo marks sit. No real photos. Positions are fractions of the picture (0..1),
 * the same as a mark's x and y.
 */
export type PartShape = "plate" | "flange" | "block" | "bracket" | "wheel" | "bar";
export type DrawnDefect = { kind: "spots" | "cavity" | "unfilled" | "line" | "flecks" | "soot"; x: number; y: number };

const W = 800;
const H = 600;

/** A small deterministic random source, so the demo pictures are the same on every seed. */
function randomFrom(seed: number) {
  let s = seed % 2147483647 || 1;
  return () => ((s = (s * 16807) % 2147483647) - 1) / 2147483646;
}

const OUTLINES: Record<PartShape, string> = {
  plate: `<rect x="120" y="120" width="560" height="360" rx="18"/>`,
  flange: `<circle cx="400" cy="300" r="220"/>`,
  block: `<path d="M170 460 L230 150 L570 150 L630 460 Z"/>`,
  bracket: `<path d="M160 120 L300 120 L300 360 L640 360 L640 480 L160 480 Z"/>`,
  wheel: `<circle cx="400" cy="300" r="230"/>`,
  bar: `<rect x="80" y="230" width="640" height="140" rx="12"/>`,
};

/** Surface details that make each shape read as a part: ribs, bolt holes, spokes. */
const DETAILS: Record<PartShape, string> = {
  plate: [200, 320, 440, 560]
    .map((x) => `<rect x="${x}" y="150" width="22" height="300" rx="6" fill="#9aa0a6"/>`)
    .join(""),
  flange:
    [0, 60, 120, 180, 240, 300]
      .map((a) => {
        const r = (a * Math.PI) / 180;
        return `<circle cx="${400 + 170 * Math.cos(r)}" cy="${300 + 170 * Math.sin(r)}" r="18" fill="#c8b48a"/>`;
      })
      .join("") + `<circle cx="400" cy="300" r="70" fill="#c8b48a"/>`,
  block: `<rect x="300" y="190" width="200" height="40" rx="6" fill="#9aa0a6"/>`,
  bracket: `<circle cx="230" cy="200" r="26" fill="#c8b48a"/><circle cx="560" cy="420" r="22" fill="#c8b48a"/>`,
  wheel:
    [0, 72, 144, 216, 288]
      .map((a) => `<rect x="390" y="110" width="20" height="190" fill="#9aa0a6" transform="rotate(${a} 400 300)"/>`)
      .join("") + `<circle cx="400" cy="300" r="45" fill="#9aa0a6"/><circle cx="400" cy="300" r="16" fill="#c8b48a"/>`,
  bar: `<rect x="110" y="285" width="580" height="10" fill="#9aa0a6"/>`,
};

function defectSvg(d: DrawnDefect, rnd: () => number): string {
  const cx = d.x * W;
  const cy = d.y * H;
  const jitter = (r: number) => (rnd() - 0.5) * 2 * r;
  switch (d.kind) {
    case "spots": // gas porosity: round, smooth-walled holes in a cluster
      return Array.from(
        { length: 28 },
        () => `<circle cx="${cx + jitter(60)}" cy="${cy + jitter(45)}" r="${2 + rnd() * 6}" fill="#2b2d30"/>`,
      ).join("");
    case "cavity": {
      // shrinkage: a jagged, dendritic hollow
      const pts = Array.from({ length: 14 }, (_, i) => {
        const a = (i / 14) * 2 * Math.PI;
        const r = 25 + rnd() * 35;
        return `${cx + r * Math.cos(a)},${cy + r * 0.7 * Math.sin(a)}`;
      });
      return `<polygon points="${pts.join(" ")}" fill="#1f2124"/>`;
    }
    case "unfilled": // misrun: the metal stopped short (clipped to the part), sand shows through behind a rounded front
      return `<ellipse cx="${cx}" cy="${cy}" rx="95" ry="70" fill="#c8b48a"/><ellipse cx="${cx}" cy="${cy}" rx="95" ry="70" fill="none" stroke="#6d7278" stroke-width="5"/>`;
    case "line": {
      // cold shut, fold, hot tear: a dark seam
      const pts = Array.from({ length: 9 }, (_, i) => `${cx - 90 + i * 22},${cy + jitter(10)}`);
      return `<polyline points="${pts.join(" ")}" fill="none" stroke="#25272a" stroke-width="4"/>`;
    }
    case "flecks": // dross or sand: angular specks, lighter than holes
      return Array.from({ length: 16 }, () => {
        const x = cx + jitter(55);
        const y = cy + jitter(40);
        return `<polygon points="${x},${y} ${x + 8 + rnd() * 6},${y + 3} ${x + 3},${y + 9}" fill="#5b4f3c"/>`;
      }).join("");
    case "soot": // lost-foam residue: a dull, sooty smear
      return `<ellipse cx="${cx}" cy="${cy}" rx="110" ry="45" fill="#3a3a3a" opacity="0.55"/>`;
  }
}

/** A JPEG of the part with its defects, about 40 kB. */
export async function drawCasting(shape: PartShape, defects: DrawnDefect[], seed: number): Promise<Buffer> {
  const rnd = randomFrom(seed);
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}">
  <defs><linearGradient id="metal" x1="0" y1="0" x2="1" y2="1">
    <stop offset="0" stop-color="#c9cdd1"/><stop offset="0.5" stop-color="#a9aeb3"/><stop offset="1" stop-color="#8d9297"/>
  </linearGradient><clipPath id="part">${OUTLINES[shape]}</clipPath></defs>
  <rect width="${W}" height="${H}" fill="#c8b48a"/>
  ${Array.from({ length: 400 }, () => `<circle cx="${rnd() * W}" cy="${rnd() * H}" r="1.5" fill="#a8946a"/>`).join("")}
  <g fill="url(#metal)" stroke="#6d7278" stroke-width="4">${OUTLINES[shape]}</g>
  ${DETAILS[shape]}
  <g clip-path="url(#part)">${defects.map((d) => defectSvg(d, rnd)).join("")}</g>
</svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 82 }).toBuffer();
}
