// A machine's own figures (its last reading on the fleet list, the machine page, the walkaround,
// stale meters) are its primary meter's: the stored summary is per meter since migration 0026.
import { Op, type Transaction } from 'sequelize';
import { MachineForecast, MachineMeter } from '../models';

/**
 * SQL joining a machine m to its primary meter pm and that meter's forecast f (LEFT: a machine
 * before its first summary has none); the partial unique index on the primary finds pm by key.
 */
export const PRIMARY_FORECAST_JOIN = `JOIN machine_meters pm ON pm.machine_id = m.id AND pm.is_primary
     LEFT JOIN machine_forecasts f ON f.meter_id = pm.id AND f.organization_id = m.organization_id`;

const primaryOnly = [
  { model: MachineMeter, as: 'meter', where: { isPrimary: true }, attributes: [] },
];

/** The stored forecast of the machine's primary meter, or null before its first summary. */
export function primaryForecastOf(
  machine: { id: string; organizationId: string },
  transaction?: Transaction,
) {
  return MachineForecast.findOne({
    where: { organizationId: machine.organizationId, machineId: machine.id },
    include: primaryOnly,
    transaction,
  });
}

/** The primary meters' stored forecasts of these machines (machineId on each). */
export function primaryForecastsOf(
  organizationId: string,
  machineIds: string[],
  options: { attributes?: (keyof MachineForecast)[]; transaction?: Transaction } = {},
) {
  return MachineForecast.findAll({
    where: { organizationId, machineId: { [Op.in]: machineIds } },
    include: primaryOnly,
    ...(options.attributes && { attributes: options.attributes }),
    transaction: options.transaction,
  });
}
