// Turns the demo SVG into a PNG that looks scanned: paper tone, slight rotation, blur, grain and dust.
import { chromium } from '@playwright/test';

export interface ScanLook {
  width: number;
  height: number;
  rotationDegrees: number;
  seed: number;
}

// Runs in the page: no imports, only its arguments.
async function paint(args: { svg: string; look: ScanLook }): Promise<string> {
  const { svg, look } = args;
  const { width: W, height: H } = look;
  let state = look.seed >>> 0;
  // A small 32-bit mixing generator, so the grain is the same on every run.
  const rand = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const canvas = document.createElement('canvas');
  canvas.width = W;
  canvas.height = H;
  const ctx = canvas.getContext('2d')!;
  // Paper: a warm tone, uneven light across the sheet and a darker edge where the lid did not close.
  ctx.fillStyle = '#f2ead6';
  ctx.fillRect(0, 0, W, H);
  const light = ctx.createRadialGradient(W * 0.45, H * 0.4, 100, W * 0.5, H * 0.5, W * 0.75);
  light.addColorStop(0, 'rgba(255,252,240,0.35)');
  light.addColorStop(1, 'rgba(120,100,60,0.10)');
  ctx.fillStyle = light;
  ctx.fillRect(0, 0, W, H);
  const edge = ctx.createLinearGradient(0, 0, 26, 0);
  edge.addColorStop(0, 'rgba(60,50,35,0.35)');
  edge.addColorStop(1, 'rgba(60,50,35,0)');
  ctx.fillStyle = edge;
  ctx.fillRect(0, 0, 26, H);
  // Paper fibre: coarse low-resolution mottling, scaled up smoothly.
  const fibre = document.createElement('canvas');
  fibre.width = W / 8;
  fibre.height = H / 8;
  const fctx = fibre.getContext('2d')!;
  const fimg = fctx.createImageData(fibre.width, fibre.height);
  for (let i = 0; i < fimg.data.length; i += 4) {
    const g = 150 + rand() * 100;
    fimg.data[i] = g; fimg.data[i + 1] = g * 0.97; fimg.data[i + 2] = g * 0.9; fimg.data[i + 3] = 26;
  }
  fctx.putImageData(fimg, 0, 0);
  ctx.imageSmoothingEnabled = true;
  ctx.drawImage(fibre, 0, 0, W, H);
  // The drawing, turned a little as if laid crooked on the glass, slightly soft.
  const img = new Image();
  img.src = 'data:image/svg+xml;charset=utf-8,' + encodeURIComponent(svg);
  await img.decode();
  ctx.save();
  ctx.translate(W / 2, H / 2);
  ctx.rotate((look.rotationDegrees * Math.PI) / 180);
  ctx.translate(-W / 2, -H / 2);
  ctx.globalCompositeOperation = 'multiply';
  ctx.filter = 'blur(0.45px)';
  ctx.drawImage(img, 0, 0, W, H);
  ctx.restore();
  // Dust and small specks.
  ctx.fillStyle = 'rgba(40,35,30,0.55)';
  for (let i = 0; i < 260; i++) {
    ctx.beginPath();
    ctx.arc(rand() * W, rand() * H, 0.4 + rand() * 1.3, 0, Math.PI * 2);
    ctx.fill();
  }
  ctx.strokeStyle = 'rgba(70,60,50,0.25)';
  ctx.lineWidth = 0.8;
  for (let i = 0; i < 5; i++) {
    const x = rand() * W;
    const y = rand() * H;
    ctx.beginPath();
    ctx.moveTo(x, y);
    ctx.bezierCurveTo(x + 20 * rand(), y + 15, x - 10, y + 30 * rand(), x + 25 * rand(), y + 40);
    ctx.stroke();
  }
  // Sensor grain: faint monochrome noise in 2 × 2 px cells (finer grain would triple the file size).
  const px = ctx.getImageData(0, 0, W, H);
  const d = px.data;
  for (let y = 0; y < H; y += 2) {
    for (let x = 0; x < W; x += 2) {
      const n = Math.round((rand() + rand() - 1) * 4);
      for (const i of [(y * W + x) * 4, (y * W + x + 1) * 4, ((y + 1) * W + x) * 4, ((y + 1) * W + x + 1) * 4]) {
        d[i] += n; d[i + 1] += n; d[i + 2] += n;
      }
    }
  }
  ctx.putImageData(px, 0, 0);
  return canvas.toDataURL('image/png');
}

/** Returns the PNG bytes of the "scanned" drawing, rendered in headless Chromium (no network). */
export async function rasterise(svg: string, look: ScanLook): Promise<Buffer> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync'],
  });
  try {
    const page = await browser.newPage({ viewport: { width: 800, height: 600 }, deviceScaleFactor: 1 });
    await page.setContent('<!doctype html><html><body></body></html>');
    // tsx keeps function names through a helper; give the page a stand-in so the function runs there.
    await page.addScriptTag({ content: 'globalThis.__name = (f) => f;' });
    const dataUrl = await page.evaluate(paint, { svg, look });
    return Buffer.from(dataUrl.slice(dataUrl.indexOf(',') + 1), 'base64');
  } finally {
    await browser.close();
  }
}
