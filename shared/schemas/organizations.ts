import { z } from 'zod';
import { ORGANIZATION_KINDS, UNIT_SYSTEMS } from '../constants';
import { boundedNumber, plainText } from './common';

// An organization of one's own: a farm (its money, units and usual season) or a dealer. The
// fields carry no defaults, so an update changes only what it names; creation adds them.

/** Ranges of an organization's numbers; the labour rate fits an integer column. */
export const ORGANIZATION_BOUNDS = {
  labourRateMinor: { min: 0, max: 100_000_000, int: true },
  digestHour: { min: 0, max: 23, int: true },
  month: { min: 1, max: 12, int: true },
} as const;

/** The IANA name the runtime knows this zone by, or null when it knows no such zone. */
export function canonicalTimeZone(value: string): string | null {
  try {
    return new Intl.DateTimeFormat('en-US', { timeZone: value }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

let currencies: Set<string> | null = null;
/** Whether the code is an ISO 4217 currency the runtime knows (any three capitals without Intl's list). */
export function isCurrencyCode(code: string): boolean {
  if (!/^[A-Z]{3}$/.test(code)) return false;
  const supported = (Intl as { supportedValuesOf?: (key: string) => string[] }).supportedValuesOf;
  if (!supported) return true;
  currencies ??= new Set(supported('currency'));
  return currencies.has(code);
}

const timeZone = plainText(64, { required: 'Choose a time zone' })
  .refine((v) => canonicalTimeZone(v) !== null, {
    error: 'Time zone must be an IANA name, like America/Chicago or Europe/Dublin',
  })
  .overwrite((v) => canonicalTimeZone(v) ?? v);

const currency = plainText(3, { required: 'Choose a currency' })
  .overwrite((v) => v.toUpperCase())
  .refine(isCurrencyCode, {
    error: 'Currency must be an ISO 4217 code of three letters, like USD, EUR or GBP',
  });

const organizationFields = {
  name: plainText(120, { required: 'Enter a name' }),
  timeZone,
  currency,
  units: z.enum(UNIT_SYSTEMS, { error: `Units must be one of: ${UNIT_SYSTEMS.join(', ')}` }),
  labourRateMinor: boundedNumber(
    'Labour rate (minor units per hour)',
    ORGANIZATION_BOUNDS.labourRateMinor,
  ),
  seasonMonths: z
    .array(boundedNumber('Month', ORGANIZATION_BOUNDS.month), {
      error: 'Season months must be a list of months 1–12',
    })
    .max(12, { error: 'At most 12 months' })
    .refine((months) => new Set(months).size === months.length, {
      error: 'Name each month once',
    }),
  digestHour: boundedNumber('Digest hour', ORGANIZATION_BOUNDS.digestHour),
};

/**
 * Settings only a farm has: a dealer refuses them by name. Units are both kinds': a dealer's pick
 * the stock units of its parts forecast (litres and kg, or US gallons and pounds).
 */
export const FARM_ONLY_FIELDS = ['labourRateMinor', 'seasonMonths', 'digestHour'] as const;

export const farmCreateSchema = z
  .object({
    kind: z.literal('farm'),
    name: organizationFields.name,
    timeZone: organizationFields.timeZone,
    currency: organizationFields.currency,
    units: organizationFields.units.default('metric'),
    labourRateMinor: organizationFields.labourRateMinor.default(0),
    seasonMonths: organizationFields.seasonMonths.default([]),
  })
  .strict();

export const dealerCreateSchema = z
  .object({
    kind: z.literal('dealer'),
    name: organizationFields.name,
    timeZone: organizationFields.timeZone,
    currency: organizationFields.currency,
    units: organizationFields.units.default('metric'),
  })
  .strict();

export const organizationCreateSchema = z.discriminatedUnion(
  'kind',
  [farmCreateSchema, dealerCreateSchema],
  { error: `Kind must be one of: ${ORGANIZATION_KINDS.join(', ')}` },
);
export type OrganizationCreateInput = z.infer<typeof organizationCreateSchema>;

/** Only the fields sent; an unknown field is refused by name. */
export const organizationUpdateSchema = z.object(organizationFields).partial().strict();
export type OrganizationUpdateInput = z.infer<typeof organizationUpdateSchema>;

/** Deleting asks for the organization's name, typed, so it is never one slip of a click. */
export const organizationDeleteSchema = z
  .object({
    confirmName: plainText(120, { required: "Type the organization's name to confirm" }),
  })
  .strict();
export type OrganizationDeleteInput = z.infer<typeof organizationDeleteSchema>;

export const organizationSettingsSchema = z.object({
  id: z.string(),
  kind: z.enum(ORGANIZATION_KINDS),
  name: z.string(),
  timeZone: z.string(),
  currency: z.string(),
  units: z.enum(UNIT_SYSTEMS),
  labourRateMinor: z.number(),
  seasonMonths: z.array(z.number()),
  digestHour: z.number(),
});
export type OrganizationSettings = z.infer<typeof organizationSettingsSchema>;

export const organizationAbilitiesSchema = z.object({
  update: z.boolean(),
  delete: z.boolean(),
  /** the farm's data export (GET /organizations/:orgId/export) */
  export: z.boolean(),
});
export type OrganizationAbilities = z.infer<typeof organizationAbilitiesSchema>;

export const organizationResponseSchema = z.object({
  data: organizationSettingsSchema,
  abilities: organizationAbilitiesSchema,
});
export type OrganizationResponse = z.infer<typeof organizationResponseSchema>;
