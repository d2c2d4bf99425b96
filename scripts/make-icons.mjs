// Draws the add-in icons (an orbit ellipse around a central body, with a satellite dot) as PNGs
// with antialiasing by supersampling; no image library needed. Run: node scripts/make-icons.mjs
import { deflateSync } from "node:zlib";
import { writeFileSync, mkdirSync } from "node:fs";

const crcTable = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
const crc32 = (buf) => {
  let c = 0xffffffff;
  for (const b of buf) c = crcTable[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
};
function chunk(type, data) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const td = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(td));
  return Buffer.concat([len, td, crc]);
}
function png(size, pixel) {
  const raw = Buffer.alloc(size * (size * 4 + 1));
  const ss = 4;
  for (let y = 0; y < size; y++) {
    raw[y * (size * 4 + 1)] = 0;
    for (let x = 0; x < size; x++) {
      let acc = [0, 0, 0, 0];
      for (let sy = 0; sy < ss; sy++)
        for (let sx = 0; sx < ss; sx++) {
          const p = pixel((x + (sx + 0.5) / ss) / size, (y + (sy + 0.5) / ss) / size);
          acc = acc.map((v, i) => v + p[i] * (i === 3 ? 1 : p[3]));
        }
      const a = acc[3] / (ss * ss);
      const o = y * (size * 4 + 1) + 1 + x * 4;
      for (let i = 0; i < 3; i++) raw[o + i] = a > 0 ? Math.round(acc[i] / acc[3]) : 0;
      raw[o + 3] = Math.round(a * 255);
    }
  }
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr[8] = 8;
  ihdr[9] = 6;
  return Buffer.concat([Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]), chunk("IHDR", ihdr), chunk("IDAT", deflateSync(raw)), chunk("IEND", Buffer.alloc(0))]);
}
const deepBlue = [23, 58, 110, 1];
const teal = [0, 150, 136, 1];
const amber = [245, 166, 35, 1];
const none = [0, 0, 0, 0];
function icon(u, v) {
  const x = u - 0.5, y = v - 0.5;
  // rounded-square tile
  const q = Math.max(Math.abs(x) - 0.38, 0) ** 2 + Math.max(Math.abs(y) - 0.38, 0) ** 2;
  if (q > 0.12 ** 2) return none;
  // tilted orbit ellipse
  const t = -0.45, cx = x * Math.cos(t) - y * Math.sin(t), cy = x * Math.sin(t) + y * Math.cos(t);
  const ring = Math.abs(Math.hypot(cx / 0.36, cy / 0.17) - 1);
  const sat = Math.hypot(x - 0.29, y + 0.2);
  if (sat < 0.075) return amber;
  if (ring < 0.09) return [230, 240, 255, 1];
  if (Math.hypot(x, y) < 0.13) return teal;
  return deepBlue;
}
mkdirSync("assets", { recursive: true });
for (const s of [16, 32, 64, 80, 128]) writeFileSync(`assets/icon-${s}.png`, png(s, icon));
console.log("icons written");
