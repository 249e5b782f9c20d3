// Renders the app icon (public/catline-icon.svg) to the PNG sizes a tablet asks for when installing
// Catline. Run after changing the icon: `node scripts/render-icons.mjs` in apps/web.
import { readFileSync } from 'node:fs';
import { chromium } from 'playwright-core';

const svg = readFileSync(new URL('../public/catline-icon.svg', import.meta.url), 'utf8');
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] });
for (const size of [192, 512]) {
  const page = await browser.newPage({ viewport: { width: size, height: size } });
  await page.setContent(`<style>html,body{margin:0}svg{display:block;width:${size}px;height:${size}px}</style>${svg}`);
  await page.screenshot({ path: new URL(`../public/catline-icon-${size}.png`, import.meta.url).pathname });
  await page.close();
}
await browser.close();
