import type { Page } from 'playwright-core';
// The browser tests share one seeded demo, and vitest orders their files itself (by size and past
// duration), so a file must pass whichever ran before it. Each file therefore writes only to
// machines of Larkspur Flats Farm that no other file touches, and takes them from here.

/** fleet-forecast.e2e.ts logs hours on these two (hour-metered, with readings in the demo). */
export const LOG_HOURS_FLEET = ['C-01', 'T-03'] as const;

/** service-record.e2e.ts completes a visit on this one (a task reset and a meter reading). */
export const SERVICE_RECORD_FLEET = 'M-01';

/** Read by fleet-forecast.e2e.ts (T-02's page, an import it refuses) as the demo loaded them. */
export const READ_AS_LOADED_FLEET = ['T-01', 'T-02'] as const;

/** safety-states.e2e.ts tags this one out, closes its defect and returns it to service (Sam's). */
export const SAFETY_STATES_FLEET = 'TR-01';

/**
 * fleet-forecast.e2e.ts adds this machine (no operators, no readings) and logs its first reading
 * on the machine page: no demo machine is free of the other files.
 */
export const MACHINE_PAGE_READING_FLEET = 'RD-01';

/**
 * role-flows.e2e.ts adds these (no readings): RF-01 and the tagged-out RF-03 assigned to lena,
 * RF-02 to sam; it starts a walkaround on RF-01 and tags RF-03 out. RF-04 gets one task with a
 * hazard and a visit planned for next Monday (the shop week of that date shows it).
 */
export const ROLE_FLOWS_FLEET = ['RF-01', 'RF-02', 'RF-03', 'RF-04'] as const;

/** due-truth.e2e.ts adds this machine with a task 38 h past its meter (issue 10, due truth). */
export const DUE_TRUTH_FLEET = 'OD-01';

/**
 * planned-once.e2e.ts adds this machine (one task, two readings), plans a visit on it, completes
 * that plan from Record service and attaches a photo to the record (issue 10).
 */
export const PLANNED_ONCE_FLEET = 'PL-01';

/**
 * advisor.e2e.ts adds this machine at Larkspur Flats (readings, a task 38 h past its meter, one
 * 12 days past its date) and records a service on it as the demo's dealer advisor (issue 10).
 */
export const ADVISOR_FLEET = 'AD-01';

/** service-library.e2e.ts adds this used baler (one reading) and applies a machine class to it. */
export const LIBRARY_FLEET = 'LB-01';

/**
 * spec-sheet.e2e.ts adds this tractor (one reading), fills its spec sheet, records a visit with a
 * measurement outside the sheet's spec and raises a defect from it (issue 11).
 */
export const SPEC_SHEET_FLEET = 'SP-01';

/**
 * restricted-use.e2e.ts adds this machine (a tractor of lena's, no readings), restricts it on its
 * page as the manager and opens its walkaround as lena.
 */
export const RESTRICTED_USE_FLEET = 'RU-01';

/**
 * season-service.e2e.ts adds this combine (harvest August–October, no readings) and gives it a
 * pre-season service on its page (issue 11).
 */
export const SEASON_SERVICE_FLEET = 'SE-01';

/**
 * daily-care.e2e.ts adds this tractor of lena's (a reading, two daily-care tasks) and greases it
 * in her walkaround (issue 11).
 */
export const DAILY_CARE_FLEET = 'DC-01';

/**
 * offline.e2e.ts adds these tractors of lena's (a reading each): OF-01 is walked round offline
 * with a photo, OF-02 gets a Log hours reading offline and then a refused one (issue 14).
 */
export const OFFLINE_FLEET = ['OF-01', 'OF-02'] as const;

/**
 * telematics.e2e.ts adds this tractor (a serial number, one reading) and posts engine hours for
 * it with an API key made in Settings (issue 13).
 */
export const TELEMATICS_FLEET = 'TM-01';

/**
 * meters.e2e.ts adds these (issue 13): MT-01, a tractor that gets a PTO-hours meter, a reading
 * and a task on it; MT-02, a baler of lena's whose bale counter she resets.
 */
export const METERS_FLEET = ['MT-01', 'MT-02'] as const;

/**
 * hitch.e2e.ts adds these (issue 13): HX-01 a tractor of lena's with readings, HX-02 a tractor
 * of no one's, HK-01 an implement of lena's with a 50 h task, HK-02 an implement of lena's kept
 * on HX-02; it hitches, logs readings and answers the walkaround's hitch question on HX-01.
 */
export const HITCH_FLEET = ['HX-01', 'HX-02', 'HK-01', 'HK-02'] as const;

/**
 * season-hours.e2e.ts adds this tractor (readings, no season months) and plans its next season by
 * area and work rate (issue 17).
 */
export const SEASON_HOURS_FLEET = 'SH-01';

/**
 * season-forecast.e2e.ts adds these (issue 17): SF-01, a combine with a year of history idle
 * before its season (two tasks: one with the two outcomes, one with the before-the-peak advice);
 * SF-02, a young tractor with season months, dated from them.
 */
export const SEASON_FORECAST_FLEET = ['SF-01', 'SF-02'] as const;

/** What walkaround.e2e.ts must not tag out or walk round: every machine another file relies on. */
export const WRITTEN_OR_READ_BY_OTHERS: ReadonlySet<string> = new Set([
  ...LOG_HOURS_FLEET,
  SERVICE_RECORD_FLEET,
  ...READ_AS_LOADED_FLEET,
  SAFETY_STATES_FLEET,
  MACHINE_PAGE_READING_FLEET,
  ...ROLE_FLOWS_FLEET,
  DUE_TRUTH_FLEET,
  PLANNED_ONCE_FLEET,
  LIBRARY_FLEET,
  ADVISOR_FLEET,
  SPEC_SHEET_FLEET,
  RESTRICTED_USE_FLEET,
  SEASON_SERVICE_FLEET,
  DAILY_CARE_FLEET,
  ...OFFLINE_FLEET,
  TELEMATICS_FLEET,
  ...METERS_FLEET,
  SEASON_HOURS_FLEET,
  ...SEASON_FORECAST_FLEET,
]);

/** The signed-in person's Larkspur Flats Farm membership: its organization id and time zone. */
export async function larkspurFarm(page: Page): Promise<{ id: string; timeZone: string }> {
  const me = await (await page.request.get('/api/v1/me')).json();
  return me.data.memberships.find(
    (m: { organization: { name: string } }) => m.organization.name === 'Larkspur Flats Farm',
  ).organization;
}
