import { readTypedNumber } from './typed-number';

// How people type numbers into forms (common practice, no source).
describe('readTypedNumber', () => {
  it('reads a decimal point, a decimal comma and scientific notation', () => {
    expect(readTypedNumber(' 2.83 ')).toEqual({ value: 2.83 });
    expect(readTypedNumber('5,66')).toEqual({ value: 5.66 });
    expect(readTypedNumber('1.2e-3')).toEqual({ value: 0.0012 });
    expect(readTypedNumber('-30')).toEqual({ value: -30 });
  });
  it('tells empty text from text that is not a number', () => {
    expect(readTypedNumber('   ')).toEqual({});
    for (const t of ['abc', '1,2,3', '0x10', 'Infinity', '2.83 V']) expect(readTypedNumber(t)).toEqual({ invalid: true });
  });
});
