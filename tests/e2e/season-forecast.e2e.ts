// Issue 17, the season forecast as a person reads it on a machine's page. SF-01 is a combine with a
// year of history, idle now, whose season last year began 50 days after today's date and ran 60 days
// at 8 h/day; the forecast (README "The forecasting method": last year moved by a start shift of
// sd 14 days — one past year — at a pace of sd 0.2, split ×e^∓√2·0.2 = ×0.754 / ×1 / ×1.327) says
// of its oil change (420 h to go) "late this season (…) or early next (…), likelier this season",
// and of its belt check (240 h to go) "Do it before …: … h early, avoids a stop in the busy season".
// A third task, past its calendar date, is only "Overdue" and by how much: no projection. SF-02, a
// young tractor with season months, says its dates come from those months, not yet from a year
// of its own history. Day numbers below count from today (the farm's local date).
//
// Worked by hand from the readings this file writes (the forecast is a distribution over start
// shifts on a 2-day grid, read on 4-day steps, so each figure is given with the slack those steps
// and the shift spread allow; the figures the app gave when this was written are in brackets):
// - Oil change, 420 h to go. Median: 420 / 8 = 52.5 days after the start on day 50 → about day
//   102.5, inside the 60-day season (days 50–110): likelier this season [105]. Earliest (90th
//   percentile of start and pace together): start sd 14 days, pace sd 0.2 × 52.5 = 10.5 days,
//   together √(14² + 10.5²) = 17.5 days; 102.5 − 1.28 × 17.5 ≈ day 80 [81]. This season ends where
//   the median profile goes idle: last year's end (day 110) carried by the later half of the start
//   shifts, up to about a week [115]. The next season starts a year after this one: day 50 + 365
//   = 415, give or take a step [414]. Latest (10th percentile): at ×0.754 the season logs 0.754 ×
//   480 = 362 h, 58 h short; the next season then starts late (+1.28 × 14 ≈ 18 days) and at 0.754 ×
//   8 = 6.03 h/day needs 58 / 6.03 = 9.6 days: 415 + 18 + 9.6 ≈ day 443 [440].
// - Belt check, 240 h to go: median 240 / 8 = 30 days into the season (day 80), a busy day. The
//   busy run (at least half a working day) starts once half the start shifts have begun (day 50 +
//   1, shifts being odd days) at the next 4-day step: do it by the day before, about day 50 [51].
//   Hours early: the 240 h still to go when the season starts, less what the median logs in its
//   ramp before the busy run (at most one 4-day step under half a working day, < 4 × 4 = 16 h):
//   between 224 and 240 h [229.4].
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { beforePeakText, dueSpreadText } from '../../shared/domain/due-words';
import { daysBetweenIso, todayIso } from '../../shared/domain/calendar';
import type { DuePoint } from '../../shared/domain/types';
import { launchBrowser, screenshot, signIn, type TestBrowser } from './support/browser';
import { SEASON_FORECAST_FLEET, larkspurFarm } from './support/demo-fleet';
import { addOwnMachine } from './support/own-machine';

const DESKTOP = { width: 1280, height: 800 };
const DAY = 86_400_000;
const [COMBINE, YOUNG] = SEASON_FORECAST_FLEET;
// the browser's formats (en-US in the test's chromium): "Feb 22, 2027", "229.4 h"
const usDate = (iso: string) =>
  new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeZone: 'UTC' }).format(
    new Date(`${iso}T12:00:00Z`),
  );
const usMeter = (value: number, unit: string) =>
  `${new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 }).format(value)} ${unit}`;
const ago = (days: number) => ({ agoMs: days * DAY + 60_000 });

describe('season forecast — two outcomes, before the peak, a young machine’s season months', () => {
  let browser: TestBrowser;
  let page: Page;
  let org: string;
  let today: string;
  let farmZone = 'UTC';
  let combineId: string;
  let youngId: string;
  const taskIds: Record<'oil' | 'belt' | 'auger', string> = { oil: '', belt: '', auger: '' };

  const addTask = async (
    name: string,
    lastDoneMeter: number,
    lastDoneDaysAgo: number,
    interval: { intervalMeter: number; intervalDays?: number } = { intervalMeter: 500 },
  ) => {
    const base = `/api/v1/organizations/${org}`;
    const task = await page.request.post(`${base}/machines/${combineId}/tasks`, {
      data: { name, ...interval },
    });
    expect(task.status()).toBe(201);
    const id = (await task.json()).data.id as string;
    const lastDoneOn = todayIso(farmZone, new Date(Date.now() - lastDoneDaysAgo * DAY));
    const done = await page.request.put(`${base}/tasks/${id}/last-done`, {
      data: { lastDoneMeter, lastDoneOn },
    });
    expect(done.status()).toBe(200);
    return id;
  };

  const dueOf = async (taskId: string): Promise<DuePoint> => {
    const res = await page.request.get(`/api/v1/organizations/${org}/machines/${combineId}/due`);
    const rows = (await res.json()).data as { taskId: string; due: DuePoint }[];
    return rows.find((r) => r.taskId === taskId)!.due;
  };
  const dayOf = (iso: string) => daysBetweenIso(today, iso);
  const taskCard = (name: string) =>
    page
      .getByRole('list', { name: 'Service tasks' })
      .getByRole('listitem')
      .filter({ has: page.getByRole('heading', { name, exact: true }) });

  beforeAll(async () => {
    browser = await launchBrowser();
    page = await browser.newPage(DESKTOP);
    await signIn(page, 'marta@larkspur.example', 'hourstone-demo');
    const farm = await larkspurFarm(page);
    org = farm.id;
    farmZone = farm.timeZone;
    today = todayIso(farmZone);
    // idle from 450 days ago; last year's season from 315 to 255 days ago (a year before days
    // 50–110) at 8 h/day: 1,000 h → 1,480 h; idle since, read today
    combineId = await addOwnMachine(
      page,
      org,
      { fleetNumber: COMBINE, name: 'Forecast combine', category: 'combine', meterUnit: 'h' },
      [
        { ...ago(450), value: 1000 },
        { ...ago(315), value: 1000 },
        { ...ago(255), value: 1480 },
        { ...ago(120), value: 1480 },
        { ...ago(0), value: 1480 },
      ],
    );
    // due at 1,900 h (420 h to go; 1,400 h was reached 265 days ago) and at 1,720 h (240 h to go;
    // 1,220 h was reached about 287 days ago)
    taskIds.oil = await addTask('Engine oil and filter', 1400, 265);
    taskIds.belt = await addTask('Rotor belt check', 1220, 287);
    // like the demo's S-01: due at 1,900 h (420 h to go, the oil change's two outcomes) or 365
    // days after its last service 400 days ago — 35 days past its date: overdue
    taskIds.auger = await addTask('Auger gearbox oil', 1000, 400, {
      intervalMeter: 900,
      intervalDays: 365,
    });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the oil change: "late this season (…) or early next (…), likelier this season" in its details', async () => {
    const due = await dueOf(taskIds.oil);
    const o = due.outcomes!;
    expect(o, 'two outcomes across the idle months').toBeDefined();
    expect(o.likelier).toBe('this_season');
    expect(dayOf(due.projectedDate!)).toBeGreaterThanOrEqual(98);
    expect(dayOf(due.projectedDate!)).toBeLessThanOrEqual(108);
    expect(dayOf(o.thisSeason.from)).toBeGreaterThanOrEqual(74);
    expect(dayOf(o.thisSeason.from)).toBeLessThanOrEqual(88);
    expect(dayOf(o.thisSeason.to)).toBeGreaterThanOrEqual(108);
    expect(dayOf(o.thisSeason.to)).toBeLessThanOrEqual(118);
    expect(dayOf(o.nextSeason.from)).toBeGreaterThanOrEqual(410);
    expect(dayOf(o.nextSeason.from)).toBeLessThanOrEqual(419);
    expect(dayOf(o.nextSeason.to)).toBeGreaterThanOrEqual(430);
    expect(dayOf(o.nextSeason.to)).toBeLessThanOrEqual(452);

    await page.goto(`/o/${org}/machines/${combineId}`);
    await page.getByRole('heading', { name: new RegExp(`^${COMBINE} · `) }).waitFor();
    const card = taskCard('Engine oil and filter');
    await card.getByText(/^Details/).click();
    const text = await card.innerText();
    // the words a person reads, from the figures checked above (same year said once per side)
    const words = dueSpreadText(due, usDate)!;
    expect(words).toMatch(
      /^late this season \(.+ – .+\) or early next \(.+ – .+\), likelier this season$/,
    );
    expect(text).toContain(`Meter reaches it`);
    expect(text).toContain(`about ${usDate(due.projectedDate!)} (${words})`);
    expect(text).toContain(`or early next (${usDate(o.nextSeason.from).replace(/, \d{4}$/, '')}`);
    await screenshot(page, 'season-forecast-two-outcomes');
  });

  it('the belt check: "Do it before …: … h early, avoids a stop in the busy season"', async () => {
    const due = await dueOf(taskIds.belt);
    const advice = due.beforePeak!;
    expect(advice, 'before-the-peak advice').toBeDefined();
    expect(dayOf(advice.doBy)).toBeGreaterThanOrEqual(47);
    expect(dayOf(advice.doBy)).toBeLessThanOrEqual(53);
    expect(advice.earlyBy).toBeGreaterThanOrEqual(224);
    expect(advice.earlyBy).toBeLessThanOrEqual(240);
    expect(due.outcomes).toBeUndefined();

    await page.goto(`/o/${org}/machines/${combineId}`);
    const card = taskCard('Rotor belt check');
    await card.getByText(/^Details/).click();
    const line = `Do it before ${usDate(advice.doBy)}: ${usMeter(advice.earlyBy, 'h')} early, avoids a stop in the busy season`;
    expect(beforePeakText(advice, 'h', usDate, usMeter)).toBe(line);
    expect(await card.innerText()).toMatch(/Before the season/);
    expect(await card.innerText()).toContain(line);
    await screenshot(page, 'season-forecast-before-peak');
  });

  it('past its date: "Overdue", "Date passed" and "35 days over", no projection or two outcomes (due list and details)', async () => {
    const due = await dueOf(taskIds.auger);
    expect(due.status).toBe('overdue');
    expect(due.remainingDays).toBe(-35);
    // the meter's projection still crosses the idle months; the screens leave it unsaid
    expect(due.outcomes).toBeDefined();

    await page.goto(`/o/${org}?horizon=7&category=combine&status=overdue`);
    const row = page
      .getByRole('table', { name: 'Due services' })
      .getByRole('row')
      .filter({ hasText: 'Auger gearbox oil' })
      .filter({ hasText: COMBINE });
    await row.getByText('35 days over').first().waitFor();
    const rowText = await row.innerText();
    expect(rowText).toContain('Overdue');
    expect(rowText).toContain('Date passed');
    expect(rowText).not.toMatch(/this season|early next|range|Do it before/);
    expect(rowText).not.toContain(usDate(due.projectedDate!));

    await page.goto(`/o/${org}/machines/${combineId}`);
    const card = taskCard('Auger gearbox oil');
    await card.getByText(/^Details/).click();
    const text = await card.innerText();
    expect(text).toContain('35 days over');
    expect(text).not.toMatch(/Meter reaches it|this season|early next/);
  });

  it('a young tractor with season months says its dates come from them, not yet from its own history', async () => {
    // its season: last month, this month and next (farm's calendar), so it is in season today
    const month = Number(today.slice(5, 7));
    const around = [month - 1, month, month + 1].map((m) => ((m + 11) % 12) + 1);
    // idle for 200 days, then 5 h/day for the last 14 days (a week and more of its season seen)
    youngId = await addOwnMachine(
      page,
      org,
      {
        fleetNumber: YOUNG,
        name: 'Young tractor',
        category: 'tractor',
        meterUnit: 'h',
        seasonMonths: around,
      },
      [
        { ...ago(200), value: 500 },
        { ...ago(14), value: 500 },
        { ...ago(7), value: 535 },
        { ...ago(0), value: 570 },
      ],
    );
    await page.goto(`/o/${org}/machines/${youngId}`);
    await page.getByRole('heading', { name: new RegExp(`^${YOUNG} · `) }).waitFor();
    await page.getByText(/^First year: dated from the season months entered for it \(/).waitFor();
    const said = await page.getByText(/^First year:/).innerText();
    expect(said).toContain('not yet from a year of its own history');
  });
});
