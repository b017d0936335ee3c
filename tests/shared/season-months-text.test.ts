import { describe, expect, it } from 'vitest';
import { seasonMonthsText } from '../../shared/domain/season-months-text';

// The words for a machine's season months, worked by hand (common practice of writing a run of
// months as its first and last): a run over New Year stays one run, apart months are listed.
describe('season months in words', () => {
  it.each([
    [[8, 9, 10], 'Aug–Oct'],
    [[1, 11, 12], 'Nov–Jan'],
    [[12, 1, 2, 11], 'Nov–Feb'],
    [[3, 6], 'Mar, Jun'],
    [[4, 5, 9, 10], 'Apr–May, Sep–Oct'],
    [[7], 'Jul'],
    [[], 'All year'],
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], 'All year'],
  ])('%j reads "%s"', (months, words) => {
    expect(seasonMonthsText(months)).toBe(words);
  });

  it('takes the month names it is given (the browser passes its own)', () => {
    expect(seasonMonthsText([11, 12, 1], (m) => `M${m}`)).toBe('M11–M1');
  });
});
