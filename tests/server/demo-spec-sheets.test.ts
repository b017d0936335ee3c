// The demo's spec sheets (server/seeders/demo-spec-sheets.ts): the self-propelled machines of both
// farms carry one, each farm in its own units, and the two farms' loader tractors differ — so
// their engine oil changes, where a task takes the sheet's figure, take different quantities.
import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { Machine, MachineSpecSheet, ServiceTask } from '../../server/models';
import { loadDemo } from '../../server/seeders/demo';

describe('demo scenario — spec sheets', () => {
  beforeEach(resetDatabase);

  it("demo — loader tractors T-03 (US gal) and T-11 (L) have different sheets; each tractor's oil change follows its own", async () => {
    await loadDemo({ reset: true });
    const machines = await Machine.findAll();
    const sheetOf = async (fleetNumber: string) => {
      const machine = machines.find((m) => m.fleetNumber === fleetNumber)!;
      return { machine, sheet: await MachineSpecSheet.findByPk(machine.id) };
    };
    const t03 = await sheetOf('T-03');
    const t11 = await sheetOf('T-11');
    expect(t03.sheet?.capacities.engineOil).toMatchObject({ quantity: 2.4, unit: 'gal' });
    expect(t11.sheet?.capacities.engineOil).toMatchObject({ quantity: 13, unit: 'L' });
    expect(t11.sheet?.testPressures.map((t) => t.name)).toContain('PTO clutch pressure');
    expect(await MachineSpecSheet.count()).toBeGreaterThanOrEqual(12);
    // the three Larkspur tractors' library oil changes each take their own sheet's
    // figure (T-01 10.5, T-02 5.5, T-03 2.4 US gal — demo-spec-sheet-data.ts)
    const oilOf = async (fleetNumber: string) => {
      const { machine } = await sheetOf(fleetNumber);
      const task = await ServiceTask.findOne({
        where: { machineId: machine.id, name: 'Engine oil and filter' },
      });
      return task?.fluids.map((f) => [f.volume, f.unit, f.capacity]);
    };
    expect(await oilOf('T-01')).toEqual([[10.5, 'gal', 'engineOil']]);
    expect(await oilOf('T-02')).toEqual([[5.5, 'gal', 'engineOil']]);
    expect(await oilOf('T-03')).toEqual([[2.4, 'gal', 'engineOil']]);
    expect(await oilOf('T-11')).toEqual([[13, 'L', 'engineOil']]);
  });
});
