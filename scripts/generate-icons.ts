/**
 * Draws the app icons (web app manifest, Apple touch icon) from the wordmark's swash, once;
 * the PNGs are committed in public/icons. Run again only when the mark changes:
 *   npx tsx --conditions=react-server scripts/generate-icons.ts
 */
import { mkdirSync } from "node:fs";
import sharp from "sharp";

const mark = (inset: number) => `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32">
  <rect width="32" height="32" ${inset ? "" : 'rx="7"'} fill="#342b21"/>
  <g transform="translate(${inset} ${inset}) scale(${(32 - 2 * inset) / 32})">
    <path d="M4 22c5-7 9-9 13-6s7 1 11-6" stroke="#f2b12c" stroke-width="3" fill="none" stroke-linecap="round"/>
    <path d="M4 27c6-4 10-5 14-3s6 0 10-3" stroke="#9cc98f" stroke-width="2" fill="none" stroke-linecap="round"/>
  </g>
</svg>`;

// A maskable icon keeps its drawing inside the central 80% safe zone (W3C Web App Manifest, "icon masks").
const ICONS = [
  { file: "icon-192.png", size: 192, inset: 0 },
  { file: "icon-512.png", size: 512, inset: 0 },
  { file: "maskable-512.png", size: 512, inset: 4 },
  { file: "apple-touch-icon.png", size: 180, inset: 2 },
];

async function main() {
  mkdirSync("public/icons", { recursive: true });
  for (const icon of ICONS) {
    await sharp(Buffer.from(mark(icon.inset)), { density: (72 * icon.size) / 32 }).resize(icon.size, icon.size).png().toFile(`public/icons/${icon.file}`);
    console.log(`public/icons/${icon.file}`);
  }
}

void main();
