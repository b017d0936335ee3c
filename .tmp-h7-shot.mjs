import { chromium } from 'playwright-core';
import fs from 'node:fs';
const dir = fs.mkdtempSync('/tmp/pg-h7/chrome-');
const ctx = await chromium.launchPersistentContext(dir, { executablePath: '/usr/bin/chromium', headless: true,
  args: ['--headless','--no-sandbox','--disable-gpu','--disable-quic','--no-first-run','--disable-background-networking','--disable-component-update','--disable-sync'],
  viewport: { width: Number(process.argv[3] ?? 390), height: 900 } });
const page = await ctx.newPage();
const base = 'http://127.0.0.1:45508';
await page.goto(base + '/sign-in');
await page.getByLabel('Email', { exact: true }).fill(process.argv[2]);
await page.getByLabel('Password', { exact: true }).fill('hourstone-demo');
await page.getByRole('button', { name: 'Sign in' }).click();
await page.waitForURL((u) => u.pathname.startsWith('/o/'));
const orgPath = new URL(page.url()).pathname.split('/').slice(0, 3).join('/');
for (const [name, path] of [['reminders', '/reminders'], ['messages', '/messages']]) {
  await page.goto(base + orgPath + path);
  await page.waitForTimeout(1500);
  await page.screenshot({ path: `/tmp/pg-h7/${name}-${process.argv[4] ?? 'x'}.png`, fullPage: true });
}
const link = page.getByRole('list', { name: 'Messages' }).getByRole('link').first();
if (await link.count()) { await link.click(); await page.waitForTimeout(1200); await page.screenshot({ path: `/tmp/pg-h7/message-${process.argv[4] ?? 'x'}.png`, fullPage: true });
  const fmt = page.getByText('Formatted'); if (await fmt.count()) { await fmt.click(); await page.waitForTimeout(800); await page.screenshot({ path: `/tmp/pg-h7/message-html-${process.argv[4] ?? 'x'}.png`, fullPage: true }); } }
console.log(orgPath);
await ctx.close();
