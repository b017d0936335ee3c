import type { Migration } from '../migrator';

// Money in integer minor units of the organization's currency (cents of USD, yen of JPY), so
// sums are exact. Machine prices become bigint columns (a combine's price in a currency without
// decimals outgrows integer); the unit costs of parts and fluids and the amounts of other costs,
// kept in the records' JSON, become unitCostMinor and amountMinor. Each amount is multiplied by
// 10^(its organization's minor digits), which is exact for every amount with at most that many
// decimals: all the forms and the demo ever wrote (prices were typed and shown in cents). A finer
// price (a fraction of a cent a litre) is rounded half up to the minor unit. The digits come
// from the runtime's ISO 4217 data, written out here so the migration never changes meaning.

type Qi = Parameters<Migration>[0]['context'];

const minorDigits = (currency: string) =>
  new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions()
    .maximumFractionDigits!;

/** Each organization's currency with its factor 10^digits, as bind parameters of unnest(). */
async function factors(qi: Qi) {
  const [rows] = await qi.sequelize.query('SELECT DISTINCT currency FROM organizations');
  const currencies = (rows as { currency: string }[]).map((r) => r.currency);
  return { bind: [currencies, currencies.map((c) => 10 ** minorDigits(c))] };
}

const PER_ORG = `JOIN unnest($1::text[], $2::bigint[]) AS f(currency, factor) ON f.currency = o.currency`;

/** The JSON array `column` with `from` (major units) renamed `to` and converted by `value`. */
const convertLines = (column: string, from: string, to: string, value: string) => `
  (SELECT coalesce(jsonb_agg(
     (e.line - '${from}') || jsonb_build_object('${to}',
       CASE WHEN jsonb_typeof(e.line -> '${from}') = 'number'
         THEN ${value.replace('$x', `(e.line ->> '${from}')::numeric`)} END)
     ORDER BY e.i), '[]'::jsonb)
   FROM jsonb_array_elements(r.${column}) WITH ORDINALITY AS e(line, i))`;

const toMinor = 'round($x * f.factor)';
const toMajor = 'trim_scale($x / f.factor)';

export const up: Migration = async ({ context: qi }) => {
  const { bind } = await factors(qi);
  await qi.sequelize.query(`
    ALTER TABLE machines
      ADD COLUMN purchase_price_minor bigint CHECK (purchase_price_minor >= 0),
      ADD COLUMN list_price_minor bigint CHECK (list_price_minor >= 0);
  `);
  await qi.sequelize.query(
    `UPDATE machines m SET
       purchase_price_minor = round(m.purchase_price * f.factor),
       list_price_minor = round(m.list_price * f.factor)
     FROM organizations o ${PER_ORG}
     WHERE o.id = m.organization_id AND (m.purchase_price IS NOT NULL OR m.list_price IS NOT NULL)`,
    { bind },
  );
  await qi.sequelize.query(
    `UPDATE service_records r SET
       parts = ${convertLines('parts', 'unitCost', 'unitCostMinor', toMinor)},
       fluids = ${convertLines('fluids', 'unitCost', 'unitCostMinor', toMinor)},
       other_costs = ${convertLines('other_costs', 'amount', 'amountMinor', toMinor)}
     FROM organizations o ${PER_ORG}
     WHERE o.id = r.organization_id`,
    { bind },
  );
  await qi.sequelize.query(
    `ALTER TABLE machines DROP COLUMN purchase_price, DROP COLUMN list_price;`,
  );
};

export const down: Migration = async ({ context: qi }) => {
  const { bind } = await factors(qi);
  await qi.sequelize.query(`
    ALTER TABLE machines ADD COLUMN purchase_price numeric(12,2), ADD COLUMN list_price numeric(12,2);
  `);
  await qi.sequelize.query(
    `UPDATE machines m SET
       purchase_price = m.purchase_price_minor / f.factor::numeric,
       list_price = m.list_price_minor / f.factor::numeric
     FROM organizations o ${PER_ORG}
     WHERE o.id = m.organization_id`,
    { bind },
  );
  await qi.sequelize.query(
    `UPDATE service_records r SET
       parts = ${convertLines('parts', 'unitCostMinor', 'unitCost', toMajor)},
       fluids = ${convertLines('fluids', 'unitCostMinor', 'unitCost', toMajor)},
       other_costs = ${convertLines('other_costs', 'amountMinor', 'amount', toMajor)}
     FROM organizations o ${PER_ORG}
     WHERE o.id = r.organization_id`,
    { bind },
  );
  await qi.sequelize.query(
    `ALTER TABLE machines DROP COLUMN purchase_price_minor, DROP COLUMN list_price_minor;`,
  );
};
