/**
 * Photos of our own making for the demo hazards: a gradient with a simple drawn shape,
 * rendered by sharp from SVG. No downloaded images.
 */
import sharp from "sharp";

function scene(sky: string, ground: string, shape: string): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="800">
  <defs><linearGradient id="g" x1="0" y1="0" x2="0" y2="1">
    <stop offset="0" stop-color="${sky}"/><stop offset="1" stop-color="${ground}"/>
  </linearGradient></defs>
  <rect width="1200" height="800" fill="url(#g)"/>
  <path d="M0 620 C 300 560, 700 700, 1200 600 L 1200 800 L 0 800 Z" fill="#5b4632" opacity="0.85"/>
  ${shape}
</svg>`;
}

const SHAPES = {
  "fallen-tree": `<rect x="180" y="520" width="860" height="70" rx="35" fill="#6b4a2b" transform="rotate(-8 600 555)"/>
    <circle cx="1000" cy="500" r="60" fill="#3d6b35"/>`,
  "wet-wooden-feature": `<rect x="250" y="470" width="700" height="40" fill="#8a6a45"/>
    <g fill="#7fb2d9" opacity="0.8"><circle cx="380" cy="460" r="14"/><circle cx="560" cy="455" r="10"/><circle cx="760" cy="462" r="16"/></g>`,
  washout: `<path d="M450 600 Q 600 760 780 600 Z" fill="#3a2a1c"/><path d="M500 640 Q 600 720 720 640" stroke="#7fb2d9" stroke-width="10" fill="none"/>`,
} as const;

export type DemoPhotoKind = keyof typeof SHAPES;

export function demoPhoto(kind: DemoPhotoKind, variant = 0): Promise<Buffer> {
  const skies = ["#9cc3e0", "#c9d6df", "#f0d9a8"];
  return sharp(Buffer.from(scene(skies[variant % skies.length], "#7d9a5b", SHAPES[kind]))).jpeg({ quality: 85 }).toBuffer();
}
