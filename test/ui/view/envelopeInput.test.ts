import { describe, expect, it } from 'vitest';
import { DEFAULT_ENVELOPE_OPTIONS } from '../../../src/figures/envelopeBands';
import { parseEnvelopeField } from '../../../src/ui/view/envelopeInput';

describe('parseEnvelopeField', () => {
  it('accepts plain decimal numbers inside the rule', () => {
    expect(parseEnvelopeField('z', ' 2.58 ', DEFAULT_ENVELOPE_OPTIONS)).toEqual({ value: 2.58 });
    expect(parseEnvelopeField('delta', '.25', DEFAULT_ENVELOPE_OPTIONS)).toEqual({ value: 0.25 });
    expect(parseEnvelopeField('errorC', '1e-1', DEFAULT_ENVELOPE_OPTIONS)).toEqual({ value: 0.1 });
  });

  it('gives a clear message for empty, non-numeric and out-of-range text', () => {
    expect(parseEnvelopeField('errorC', '', DEFAULT_ENVELOPE_OPTIONS)).toEqual({ message: 'Enter a value for C.' });
    expect(parseEnvelopeField('z', 'two', DEFAULT_ENVELOPE_OPTIONS)).toEqual({ message: 'z must be a number, e.g. 1.96; got “two”.' });
    expect(parseEnvelopeField('delta', '0.7', DEFAULT_ENVELOPE_OPTIONS)).toEqual({ message: 'δ must be a number from 0 to 0.5; got 0.7.' });
  });
});
