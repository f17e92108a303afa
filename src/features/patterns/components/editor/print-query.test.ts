import { describe, expect, it } from 'vitest';
import { lengthOption, optionsBody, toQuery, trialOptionsBody } from './print-query.ts';

const choice = { paper: 'a4', orientation: 'landscape', margin: '', overlap: '', jobSheet: false, size: 'all' };

describe('print options as the server reads them', () => {
  it('when a margin of 1/4 is typed in inches, then 6.35mm is sent (1 in = 25.4 mm, 1959 agreement)', () => {
    expect(lengthOption('1/4', 'in')).toBe('6.35mm');
    expect(lengthOption('12', 'mm')).toBe('12mm');
  });

  it('when a length field is empty, then the option is left out for the server default; junk goes as typed for the server to name', () => {
    expect(lengthOption('  ', 'in')).toBeUndefined();
    expect(lengthOption('wide', 'in')).toBe('wide');
  });

  it('when the pattern has no size run, then no size is sent; with one, the chosen size is', () => {
    expect(optionsBody(choice, 'mm', false)).toEqual({ paper: 'a4', orientation: 'landscape', jobSheet: false });
    expect(optionsBody({ ...choice, size: 'M', overlap: '1/2' }, 'in', true)).toEqual({ paper: 'a4', orientation: 'landscape', overlap: '12.7mm', jobSheet: false, size: 'M' });
  });

  it('when the options become a query, then every value is URL-encoded text (WHATWG URLSearchParams)', () => {
    expect(toQuery({ paper: 'letter', size: 'X & L', jobSheet: true })).toBe('paper=letter&size=X+%26+L&jobSheet=true');
  });

  it('when a customer girth of 14 1/2 in is typed, then 368.3mm is sent instead of the size (1 in = 25.4 mm, 1959 agreement)', () => {
    expect(optionsBody({ ...choice, size: 'M', girth: '14 1/2' }, 'in', true)).toEqual({ paper: 'a4', orientation: 'landscape', jobSheet: false, girth: '368.3mm' });
  });

  it('when a trial print is asked for, then the customer girth is left out and the size comes from the form run', () => {
    expect(trialOptionsBody({ ...choice, size: 'XL', girth: '14' }, 'in', ['S', 'M'])).toEqual({ paper: 'a4', orientation: 'landscape', jobSheet: false, size: 'all' });
    expect(trialOptionsBody({ ...choice, girth: '14' }, 'in', [])).toEqual({ paper: 'a4', orientation: 'landscape', jobSheet: false });
  });
});
