import { chromium } from 'playwright-core';
import { mkdtempSync } from 'node:fs';
const [,, email, path, out, width = '1280', action = ''] = process.argv;
const ctx = await chromium.launchPersistentContext(mkdtempSync('/tmp/h11-chr-'), { executablePath: '/usr/bin/chromium', headless: true, args: ['--headless','--no-sandbox','--disable-gpu','--disable-quic','--no-first-run','--disable-background-networking','--disable-component-update','--disable-sync'], viewport: { width: Number(width), height: 900 } });
const page = await ctx.newPage();
const errors = [];
page.on('pageerror', (e) => errors.push(e.message));
page.on('console', (m) => { if (m.type() === 'error') errors.push(m.text()); });
await page.goto('http://127.0.0.1:5511/sign-in');
await page.getByLabel('Email', { exact: true }).fill(email);
await page.getByLabel('Password', { exact: true }).fill('hourstone-demo');
await page.getByRole('button', { name: 'Sign in' }).click();
await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
const me = await page.evaluate(() => fetch('/api/v1/me').then((r) => r.json()));
const orgId = me.data.memberships[0].organization.id;
await page.goto('http://127.0.0.1:5511' + path.replace(':org', orgId));
await page.waitForTimeout(2500);
if (action === 'select') {
  const boxes = page.getByRole('checkbox');
  await boxes.nth(0).check();
  await page.getByRole('button', { name: 'Send reminder' }).click();
  await page.waitForTimeout(1500);
}
if (action === 'book') {
  await page.getByRole('checkbox').nth(0).check();
  await page.getByRole('button', { name: 'Propose booking' }).click();
  await page.waitForTimeout(800);
}
await page.screenshot({ path: out, fullPage: true });
console.log('errors:', errors);
await ctx.close();
