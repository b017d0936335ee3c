// The one caution component (src/components/ui/caution.tsx) and the words of its hazards
// (src/lib/caution-text.ts). Rendered to static HTML in node: the checks are on the words a person
// sees and the landmark a screen reader finds. The labels are shared/constants' HAZARD_LABELS
// (pto "PTO shaft", hot_fluid "Hot fluids", battery "Battery"); the deferral is SAFETY_DEFERRAL.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { Caution } from '../../src/components/ui/caution';
import { hazardNames, hazardSentence } from '../../src/lib/caution-text';

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
