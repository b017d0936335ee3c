// The yard of the daily-care tests (issue 11), worked by hand. T-01 (walkarounds-fixture.ts) reads
// 1,950 h ten days ago and 2,000 h yesterday; its schedule, in farm-local dates (America/Chicago):
//   Loader pivots and bucket pins   daily care, every 10 h, greased at 1,988 h two days ago
//                                   → due 1,998 h: 2 h over at 2,000 h → overdue; run since 12 h
//   Fuel water separator            daily care, every 10 h, done at 1,995 h yesterday
//                                   → due 2,005 h: 5 h left (warn 1 h) → ok, not yet done today
//   Engine oil and filter           a service task, every 250 h, done at 1,900 h → due 2,150 h
// T-02 has a daily-care task of its own. The intervals are common practice (8–10 h grease rounds).
import { addDaysIso, todayIso } from '../../shared/domain';
import { createMachine, createTask } from '../support/factories';
import { yard } from './walkarounds-fixture';

export async function careYard() {
  const y = await yard();
  const today = todayIso(y.org.timeZone);
  const grease = await createTask(y.machine, {
    name: 'Loader pivots and bucket pins',
    intervalMeter: 10,
    warnMeter: 1,
    dailyCare: true,
    lastDoneMeter: 1988,
    lastDoneOn: addDaysIso(today, -2),
    position: 0,
  });
  const separator = await createTask(y.machine, {
    name: 'Fuel water separator: let the water out',
    intervalMeter: 10,
    warnMeter: 1,
    dailyCare: true,
    lastDoneMeter: 1995,
    lastDoneOn: addDaysIso(today, -1),
    position: 1,
  });
  const oil = await createTask(y.machine, {
    name: 'Engine oil and filter',
    intervalMeter: 250,
    warnMeter: 25,
    lastDoneMeter: 1900,
    lastDoneOn: addDaysIso(today, -20),
    position: 2,
  });
  const other = await createMachine(y.org, { fleetNumber: 'T-02', category: 'tractor' });
  const otherGrease = await createTask(other, {
    name: 'Daily grease points',
    intervalMeter: 10,
    dailyCare: true,
  });
  return { ...y, today, grease, separator, oil, other, otherGrease };
}
