// The one hazard table (shared/domain/hazards.ts): every kind a task or checklist item can carry
// (HAZARDS, stored in the database) has its label and a caution that ends by deferring to the
// operator's manual, local regulations and qualified service practice. The texts are common
// safety practice written for this product, not a standard's wording: the checks here are on
// their presence and shape, and on the hand-written words of a few of them.
import { describe, expect, it } from 'vitest';
import {
  HAZARD_TABLE,
  hazardAdvice,
  hazardCautionLines,
  hazardCautionText,
  hazardSentence,
} from '../../shared/domain/hazards';
import { HAZARDS } from '../../shared/schemas/schedule';

const DEFERRAL = "Follow the operator's manual, local regulations and qualified service practice.";

describe('hazard table', () => {
  it('HAZARDS — ten kinds, the six stored before issue 11 first and unchanged', () => {
    expect(HAZARDS).toEqual([
      'pto',
      'hydraulic_pressure',
      'raised_load',
      'stored_energy',
      'hot_fluid',
      'battery',
      'chemicals',
      'tyres_rims',
      'power_lines',
      'hitching_crush',
    ]);
  });

  it('table — exactly the kinds of HAZARDS, no more', () => {
    expect(Object.keys(HAZARD_TABLE).sort()).toEqual([...HAZARDS].sort());
  });

  it.each(HAZARDS.map((h) => [h]))(
    'table — %s — a label, advice of at least one sentence, a caution of advice + deferral',
    (hazard) => {
      const entry = HAZARD_TABLE[hazard];
      expect(entry.label.length).toBeGreaterThan(2);
      expect(entry.advice).toMatch(/^[A-Z].{40,}\.$/);
      expect(entry.advice).not.toContain(DEFERRAL);
      expect(entry.caution).toBe(`${entry.advice} ${DEFERRAL}`);
      expect(entry.caution.endsWith(DEFERRAL)).toBe(true);
    },
  );

  it('table — the labels, by hand', () => {
    expect(Object.fromEntries(HAZARDS.map((h) => [h, HAZARD_TABLE[h].label]))).toEqual({
      pto: 'PTO shaft',
      hydraulic_pressure: 'Stored hydraulic pressure',
      raised_load: 'Raised implement or load',
      stored_energy: 'Springs and other stored energy',
      hot_fluid: 'Hot fluids',
      battery: 'Battery',
      chemicals: 'Chemicals',
      tyres_rims: 'Tyres and rims',
      power_lines: 'Overhead power lines',
      hitching_crush: 'Hitching crush points',
    });
  });

  it('pto — stop the engine, take the key, wait for the shaft to stop', () => {
    expect(HAZARD_TABLE.pto.advice).toMatch(
      /^Stop the engine, take the key and wait for the shaft to stop before/,
    );
  });
  it('hydraulic pressure — search for leaks with cardboard, never hands', () => {
    expect(HAZARD_TABLE.hydraulic_pressure.advice).toContain(
      'Search for leaks with a piece of cardboard, never your hands',
    );
  });
  it('raised load — lower or block', () => {
    expect(HAZARD_TABLE.raised_load.advice).toMatch(/^Lower raised implements.*or block them/);
  });
  it('hot fluid — drain warm, not hot, as the template steps say; never "let it cool" before draining', () => {
    expect(HAZARD_TABLE.hot_fluid.advice).toMatch(/^Drain oil warm, not hot:/);
    expect(HAZARD_TABLE.hot_fluid.advice).not.toMatch(/let (it|the machine) cool/i);
  });

  it('hazardAdvice — a value this code does not know — no advice', () => {
    expect(hazardAdvice('sharp_blade')).toBe('');
  });

  it('hazardCautionLines — battery, then an unknown value — "Label: advice", then its words', () => {
    expect(hazardCautionLines(['battery', 'sharp_blade'])).toEqual([
      'Battery: Wear eye protection and keep sparks and flames away: a battery gives off explosive gas. Disconnect the negative terminal first and reconnect it last; rinse acid off skin or eyes with plenty of water.',
      'sharp blade.',
    ]);
  });

  it('hazardCautionText — two hazards — both lines, the deferral once at the end; none — empty', () => {
    const text = hazardCautionText(['pto', 'battery']);
    expect(text.startsWith('PTO shaft: Stop the engine')).toBe(true);
    expect(text).toContain(' Battery: Wear eye protection');
    expect(text.endsWith(DEFERRAL)).toBe(true);
    expect(text.split(DEFERRAL).length - 1).toBe(1);
    expect(hazardCautionText([])).toBe('');
  });

  it('hazardSentence — three hazards, PTO first — the abbreviation kept: "PTO shaft, hot fluids and battery"', () => {
    expect(hazardSentence(['pto', 'hot_fluid', 'battery'])).toBe(
      'PTO shaft, hot fluids and battery',
    );
  });
});
