import sharp from 'sharp';

/**
 * Demo photos drawn for Tunefork: a plain side view of a buggy on a track-coloured ground, in the
 * setup's own colours. Made with sharp from SVG shapes (no text, so no fonts are needed).
 */
export async function drawDemoCarPhoto(opts: { body: string; ground: string; wing: string }): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="800" viewBox="0 0 1200 800">
  <rect width="1200" height="800" fill="#dfe7ea"/>
  <rect y="560" width="1200" height="240" fill="${opts.ground}"/>
  <path d="M0 600 Q300 560 600 600 T1200 590 V800 H0 Z" fill="#00000022"/>
  <rect x="250" y="430" width="700" height="40" rx="12" fill="#2b2f33"/>
  <path d="M330 430 Q420 300 620 300 Q800 300 880 430 Z" fill="${opts.body}"/>
  <rect x="760" y="250" width="230" height="22" rx="6" fill="${opts.wing}"/>
  <rect x="840" y="270" width="14" height="90" fill="#2b2f33"/>
  <circle cx="380" cy="520" r="95" fill="#1b1d1f"/><circle cx="380" cy="520" r="45" fill="#9aa3a8"/>
  <circle cx="830" cy="520" r="95" fill="#1b1d1f"/><circle cx="830" cy="520" r="45" fill="#9aa3a8"/>
  <rect x="300" y="455" width="120" height="16" rx="6" fill="#c9a227" transform="rotate(-18 360 463)"/>
  <rect x="770" y="455" width="120" height="16" rx="6" fill="#c9a227" transform="rotate(18 830 463)"/>
</svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 88 }).toBuffer();
}

/** Colours per demo setup title; setups not listed get no photo. */
export const DEMO_PHOTO_STYLES: Record<string, { body: string; ground: string; wing: string }> = {
  'Hollow Pines — loose and dusty': { body: '#2f6fb5', ground: '#c8a877', wing: '#e8e8e8' },
  'Brackwater rough-track truggy': { body: '#b5482f', ground: '#6f5a3e', wing: '#202020' },
  'Saltmarsh hard-pack nitro': { body: '#3f8f4f', ground: '#a58f6a', wing: '#f2f2f2' },
};
