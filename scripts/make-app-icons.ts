/**
 * Draws the installable app's icons from the Eavesight mark (public/favicon.svg's drawing):
 * `npx tsx scripts/make-app-icons.ts` writes public/icons/*.png. The maskable icon fills the whole
 * square and keeps the mark inside the central 80 % that every launcher shape leaves visible.
 */
import { mkdir, writeFile } from "node:fs/promises";
import sharp from "sharp";

const MARK = `
  <path d="M5 18.5 16 8.5l11 10" stroke="#DD6020" stroke-width="3" fill="none" stroke-linecap="round" stroke-linejoin="round"/>
  <path d="M8.5 24.5h11.5" stroke="#F4F6F8" stroke-width="2.4" stroke-linecap="round"/>
  <path d="m17.5 21.2 3.3 3.3-3.3 3.3" stroke="#F4F6F8" stroke-width="2.4" fill="none" stroke-linecap="round" stroke-linejoin="round"/>`;

const rounded = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" rx="7" fill="#171C24"/>${MARK}</svg>`;
// Full bleed, the mark scaled to 70 % around the centre (the safe zone is a circle of 80 %).
const maskable = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" fill="#171C24"/><g transform="translate(16 16.5) scale(0.7) translate(-16 -16.5)">${MARK}</g></svg>`;

const outputs: { file: string; svg: string; sizePx: number }[] = [
  { file: "icon-192.png", svg: rounded, sizePx: 192 },
  { file: "icon-512.png", svg: rounded, sizePx: 512 },
  { file: "maskable-512.png", svg: maskable, sizePx: 512 },
  { file: "apple-touch-icon-180.png", svg: maskable, sizePx: 180 },
];

await mkdir("public/icons", { recursive: true });
for (const { file, svg, sizePx } of outputs) {
  const png = await sharp(Buffer.from(svg), { density: (72 * sizePx) / 32 }).resize(sizePx, sizePx).png({ compressionLevel: 9 }).toBuffer();
  await writeFile(`public/icons/${file}`, png);
  console.log(`public/icons/${file}: ${sizePx} px, ${png.length} bytes`);
}
