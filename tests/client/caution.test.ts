// The one caution component (src/components/ui/caution.tsx) and the words of its hazards
// (src/lib/caution-text.ts). Rendered to static HTML in node: the checks are on the words a person
// sees and the landmark a screen reader finds. The labels are shared/constants' HAZARD_LABELS
// (pto "PTO shaft", hot_fluid "Hot fluids", battery "Battery"); the deferral is SAFETY_DEFERRAL;
// a task's hazards are shown in full in the words of the one table (shared/domain/hazards.ts).
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { Caution } from '../../src/components/ui/caution';
import { hazardNames, hazardSentence } from '../../src/lib/caution-text';
import { HAZARD_TABLE } from '../../shared/domain/hazards';
import { HAZARDS } from '../../shared/schemas/schedule';

const DEFERRAL =
  'Follow the operator&#x27;s manual, local regulations and qualified service practice.';
/** The words of the HTML, tags dropped: what shows on screen. */
const words = (html: string) => html.replace(/<[^>]+>/g, '');

describe('hazard words', () => {
  it('hazardNames — pto and battery — the labels as a list: "PTO shaft, Battery"', () => {
    expect(hazardNames(['pto', 'battery'])).toBe('PTO shaft, Battery');
  });
  it('hazardSentence — hot fluid and battery — lower-cased, joined by "and"', () => {
    expect(hazardSentence(['hot_fluid', 'battery'])).toBe('hot fluids and battery');
  });
  it('hazardSentence — three hazards, PTO first — the abbreviation kept: "PTO shaft, hot fluids and battery"', () => {
    expect(hazardSentence(['pto', 'hot_fluid', 'battery'])).toBe(
      'PTO shaft, hot fluids and battery',
    );
  });
  it('hazardSentence — a hazard this client does not know — its words from the value', () => {
    expect(hazardSentence(['sharp_blade'])).toBe('sharp blade');
  });
});

describe('Caution — panel', () => {
  const html = renderToStaticMarkup(
    createElement(
      Caution,
      { heading: 'Caution: PTO shaft, Battery', defer: true },
      createElement('p', null, 'Stop the engine first.'),
    ),
  );
  it('Caution panel — an aside named "Caution" (a landmark)', () => {
    expect(html).toMatch(/^<aside aria-label="Caution"/);
  });
  it('Caution panel — heading, notes and deferral all on screen, in that order', () => {
    expect(words(html)).toBe(`Caution: PTO shaft, BatteryStop the engine first.${DEFERRAL}`);
  });
  it('Caution panel — the icon is hidden from screen readers and has no hover title', () => {
    expect(html).toContain('aria-hidden="true"');
    expect(html).not.toContain('title');
  });
  it('Caution panel — another name — "Safety cautions"', () => {
    const named = renderToStaticMarkup(
      createElement(Caution, { heading: 'Caution', label: 'Safety cautions' }),
    );
    expect(named).toMatch(/^<aside aria-label="Safety cautions"/);
    expect(words(named)).toBe('Caution');
  });
  it('Caution panel — run-on text without the deferral — "Caution. Disengage the PTO."', () => {
    const item = renderToStaticMarkup(
      createElement(Caution, { heading: 'Caution.', text: 'Disengage the PTO.', compact: true }),
    );
    expect(words(item)).toBe('Caution. Disengage the PTO.');
  });
});

describe('Caution — line', () => {
  it('Caution line — a paragraph, not a landmark, with the whole sentence visible', () => {
    const html = renderToStaticMarkup(
      createElement(Caution, {
        variant: 'line',
        heading: 'Caution: hot fluids and battery.',
        defer: true,
      }),
    );
    expect(html).toMatch(/^<p /);
    expect(html).not.toContain('<aside');
    expect(words(html)).toBe(`Caution: hot fluids and battery. ${DEFERRAL}`);
  });
  it('Caution line — inline — a span (it sits inside a checkbox label)', () => {
    const html = renderToStaticMarkup(
      createElement(Caution, { variant: 'line', inline: true, heading: 'Caution: Battery.' }),
    );
    expect(html).toMatch(/^<span /);
    expect(words(html)).toBe('Caution: Battery.');
  });
  it('Caution line — heading, run-on text, deferral — one sentence each, spaced', () => {
    const html = renderToStaticMarkup(
      createElement(Caution, {
        variant: 'line',
        boxed: true,
        heading: 'Caution.',
        text: 'Release springs with the proper tool.',
        defer: true,
      }),
    );
    expect(words(html)).toBe(`Caution. Release springs with the proper tool. ${DEFERRAL}`);
  });
});

/** The same words with HTML's escapes, as renderToStaticMarkup writes them. */
const escaped = (s: string) => s.replace(/'/g, '&#x27;').replace(/"/g, '&quot;');

describe("Caution — hazards in the table's words", () => {
  it.each(HAZARDS.map((h) => [h]))(
    'Caution panel — %s — its label and its advice in full, then the deferral',
    (hazard) => {
      const { label, advice } = HAZARD_TABLE[hazard];
      const html = renderToStaticMarkup(
        createElement(Caution, { heading: 'Caution', hazards: [hazard], defer: true }),
      );
      expect(words(html)).toBe(`Caution${label}: ${escaped(advice)}${DEFERRAL}`);
    },
  );

  it.each(HAZARDS.map((h) => [h]))(
    'Caution line — %s — the whole caution in one paragraph, on screen without hovering',
    (hazard) => {
      const { label, advice } = HAZARD_TABLE[hazard];
      const html = renderToStaticMarkup(
        createElement(Caution, {
          variant: 'line',
          heading: 'Caution.',
          hazards: [hazard],
          defer: true,
        }),
      );
      expect(html).not.toContain('title=');
      expect(words(html)).toBe(`Caution. ${label}: ${escaped(advice)} ${DEFERRAL}`);
    },
  );

  it('Caution panel — hot fluids and PTO, by hand — each hazard a list item, "drain warm", the deferral once', () => {
    const html = renderToStaticMarkup(
      createElement(
        Caution,
        { heading: 'Caution', hazards: ['hot_fluid', 'pto'], defer: true },
        createElement('p', null, 'Gloves on.'),
      ),
    );
    expect(html.match(/<li>/g)).toHaveLength(2);
    expect(words(html)).toBe(
      'Caution' +
        'Hot fluids: Drain oil warm, not hot: stop the engine and let it stand until the oil is warm, not hot, so it still flows but cannot scald; wear gloves and eye protection and keep out of the stream. Open a radiator or coolant cap, or drain coolant, only once the system is cold.' +
        'PTO shaft: Stop the engine, take the key and wait for the shaft to stop before you go near the PTO, couple or uncouple a shaft or clear a blockage: a 540 rpm shaft turns 9 times a second, faster than anyone can pull free. Never step over a turning shaft; keep its guards in place and loose clothing and hair away.' +
        'Gloves on.' +
        DEFERRAL,
    );
  });

  it('Caution line — hydraulic pressure, by hand — "cardboard, never your hands"', () => {
    const html = renderToStaticMarkup(
      createElement(Caution, {
        variant: 'line',
        heading: 'Caution.',
        hazards: ['hydraulic_pressure'],
        defer: true,
      }),
    );
    expect(words(html)).toBe(
      'Caution. Stored hydraulic pressure: Lower everything to the ground, stop the engine and relieve the pressure before opening a line, fitting or filter. Search for leaks with a piece of cardboard, never your hands: oil under pressure can pierce the skin, and that needs a doctor at once. ' +
        DEFERRAL,
    );
  });

  it('Caution — a hazard this client does not know — its words, no advice', () => {
    const html = renderToStaticMarkup(
      createElement(Caution, { variant: 'line', heading: 'Caution.', hazards: ['sharp_blade'] }),
    );
    expect(words(html)).toBe('Caution. sharp blade.');
  });
});

describe('Caution — summary (a row of a long list)', () => {
  const html = renderToStaticMarkup(
    createElement(Caution, {
      variant: 'summary',
      heading: 'Caution.',
      hazards: ['pto', 'hot_fluid'],
      defer: true,
    }),
  );
  const summary = html.match(/<summary[^>]*>(.*?)<\/summary>/)?.[1] ?? '';
  it('Caution summary — a native disclosure: the hazards named in its summary, always on screen', () => {
    expect(html).toMatch(/^<details/);
    expect(words(summary)).toBe('Caution: PTO shaft, Hot fluids what to dohide');
  });
  it('Caution summary — what to do, in the one table’s words, and the deferral open beneath it', () => {
    const body = words(html.slice(html.indexOf('</summary>')));
    expect(body).toContain(`PTO shaft: ${HAZARD_TABLE.pto.advice}`);
    expect(body).toContain('Drain oil warm, not hot');
    expect(body).toContain(DEFERRAL);
    expect(words(summary)).not.toContain('Drain oil warm');
  });
  it('Caution summary — no hover title anywhere', () => {
    expect(html).not.toMatch(/title=/);
  });
  it('Caution summary — no hazards — nothing but the heading line', () => {
    const bare = renderToStaticMarkup(
      createElement(Caution, {
        variant: 'summary',
        heading: 'Caution.',
        text: 'Lower the header.',
      }),
    );
    expect(bare).not.toMatch(/<details/);
    expect(words(bare)).toBe('Caution. Lower the header.');
  });
});
