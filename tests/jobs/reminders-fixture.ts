// A small farm for the reminder tests, worked by hand. Readings climb 10 h a day for 30 days
// (1,000 → 1,300 h, the last one taken at `now`), so the due list reads:
//   T-01 Engine oil and filter   every 250 h, done at 1,000 → due 1,250 h, 50 h over   → overdue
//   T-01 Air filter              every 250 h, done at 1,100 → due 1,350 h, 50 h to go (warn 60) → due soon
//   T-01 Fuel filters            every 500 h, done at   900 → due 1,400 h, 100 h to go → 10 days → coming up
//   T-01 Coolant                 every 3,000 h, done at 1,000 → due 4,000 h, 270 days  → not in the digest
//   B-02 Knotter grease          every 30 days, done 25 days ago → calendar limit in 5 days (warn 7) → due soon
// and a loader used unevenly (8, 10 then 12 h a day: 500 → 800 h), so its projection has a range:
//   L-03 Grease pins             every 100 h, done at 750 → due 850 h, 50 h to go (warn 10)
//                                → between 50/12 ≈ 4 and 50/8 ≈ 6 days → coming up
import type { Organization } from '../../server/models';
import { addDaysIso, todayIso } from '../../shared/domain';
import { addReadings, createMachine, createTask } from '../support/factories';

export async function handWorkedFarm(org: Organization, now: Date) {
  const asOf = todayIso(org.timeZone, now);
  const tractor = await createMachine(org, {
    fleetNumber: 'T-01',
    name: 'North tractor',
    category: 'tractor',
  });
  const baler = await createMachine(org, {
    fleetNumber: 'B-02',
    name: 'Round baler',
    category: 'baler',
    meterUnit: 'bales',
  });
  await addReadings(
    tractor,
    [30, 20, 10, 0].map((daysAgo) => ({ daysAgo, value: 1300 - daysAgo * 10 })),
    now,
  );
  const oil = await createTask(tractor, {
    name: 'Engine oil and filter',
    intervalMeter: 250,
    lastDoneMeter: 1000,
    warnMeter: 25,
    hazards: ['hot_fluid'],
  });
  const air = await createTask(tractor, {
    name: 'Air filter',
    intervalMeter: 250,
    lastDoneMeter: 1100,
    warnMeter: 60,
  });
  const fuel = await createTask(tractor, {
    name: 'Fuel filters',
    intervalMeter: 500,
    lastDoneMeter: 900,
    warnMeter: 50,
  });
  const coolant = await createTask(tractor, {
    name: 'Coolant',
    intervalMeter: 3000,
    lastDoneMeter: 1000,
    warnMeter: 300,
  });
  const knotter = await createTask(baler, {
    name: 'Knotter grease',
    intervalMeter: null,
    intervalDays: 30,
    warnMeter: null,
    warnDays: 7,
    lastDoneOn: addDaysIso(asOf, -25),
  });
  const loader = await createMachine(org, {
    fleetNumber: 'L-03',
    name: 'Yard loader',
    category: 'loader',
  });
  await addReadings(
    loader,
    [
      { daysAgo: 30, value: 500 },
      { daysAgo: 20, value: 580 },
      { daysAgo: 10, value: 680 },
      { daysAgo: 0, value: 800 },
    ],
    now,
  );
  const pins = await createTask(loader, {
    name: 'Grease pins',
    intervalMeter: 100,
    lastDoneMeter: 750,
    warnMeter: 10,
  });
  return { asOf, tractor, baler, loader, tasks: { oil, air, fuel, coolant, knotter, pins } };
}
