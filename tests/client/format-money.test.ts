// Money on screen (src/lib/format.ts): amounts arrive as integer minor units with the
// organization's ISO 4217 currency. Expected strings are the CLDR forms of the named locales,
// written by hand (German puts a no-break space before the euro sign).
import { afterEach, describe, expect, it, vi } from 'vitest';

const load = async () => {
  vi.resetModules();
  return import('../../src/lib/format');
};

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('format — money in minor units', () => {
  it('formatMoney — 120450 USD in en-US is "$1,204.50"; 1500 JPY is "¥1,500"; 1234 KWD is "KWD 1.234"', async () => {
    const { formatMoney } = await load();
    expect(formatMoney(120_450, 'USD', { locale: 'en-US' })).toBe('$1,204.50');
    expect(formatMoney(1500, 'JPY', { locale: 'en-US' })).toBe('¥1,500');
    expect(formatMoney(1234, 'KWD', { locale: 'en-US' })).toBe('KWD\u00a01.234');
  });

  it('formatMoney — 120450 EUR in de-DE is "1.204,50 €"', async () => {
    const { formatMoney } = await load();
    expect(formatMoney(120_450, 'EUR', { locale: 'de-DE' })).toBe('1.204,50\u00a0€');
  });

  it('formatMoney — whole units (a machine price): 18250050 USD is "$182,501"', async () => {
    const { formatMoney } = await load();
    expect(formatMoney(18_250_050, 'USD', { locale: 'en-US', whole: true })).toBe('$182,501');
    expect(formatMoney(34_200_000, 'USD', { locale: 'en-US', whole: true })).toBe('$342,000');
  });

  it('formatMoney — one formatter per currency and locale, made once however often it formats', async () => {
    const NumberFormat = Intl.NumberFormat;
    const made: string[] = [];
    // Intl's members are not enumerable: inherit them, and count the NumberFormats made
    vi.stubGlobal(
      'Intl',
      Object.assign(Object.create(Intl) as typeof Intl, {
        NumberFormat: function (locale?: string, options?: Intl.NumberFormatOptions) {
          made.push(`${locale}|${options?.currency}`);
          return new NumberFormat(locale, options);
        },
      }),
    );
    const { formatMoney } = await load();
    for (let i = 0; i < 5; i++) formatMoney(100 * i, 'USD', { locale: 'en-US' });
    formatMoney(100, 'EUR', { locale: 'en-US' });
    formatMoney(100, 'USD', { locale: 'de-DE' });
    // each display formatter once, and once per currency the one that tells its minor digits
    expect(made).toEqual(['en-US|USD', 'en|USD', 'en-US|EUR', 'en|EUR', 'de-DE|USD']);
  });

  it('moneyInputText — what a form shows to edit: 1250 USD "12.50", 1500 JPY "1500", 1234 KWD "1.234", none ""', async () => {
    const { moneyInputText } = await load();
    expect(moneyInputText(1250, 'USD')).toBe('12.50');
    expect(moneyInputText(5, 'USD')).toBe('0.05');
    expect(moneyInputText(1500, 'JPY')).toBe('1500');
    expect(moneyInputText(1234, 'KWD')).toBe('1.234');
    expect(moneyInputText(null, 'USD')).toBe('');
    expect(moneyInputText(undefined, 'USD')).toBe('');
    expect(moneyInputText(Number.NaN, 'USD')).toBe('');
  });
});
