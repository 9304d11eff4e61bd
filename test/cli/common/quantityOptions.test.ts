import { describe, expect, it } from 'vitest';
import { optionalQuantityOption, positiveQuantityOption, quantityOption } from '../../../cli/common/quantityOptions';
import { UsageError } from '../../../cli/verb';
import { expectClose } from '../../support/assertInDelta';

// NIST SP 811 (2008) B.8: 1 ft = 0.3048 m, 1 lb = 0.45359237 kg (exact).
const FT = 0.3048;
const LB = 0.45359237;

describe('quantityOption', () => {
  it('quantityOption converts the text to SI', () => {
    expectClose(quantityOption({ altitude: '35000 ft' }, 'altitude', 'length'), 35000 * FT, { rel: 1e-15 }, 'NIST SP 811 ft');
    expectClose(quantityOption({ weight: '33000 lb' }, 'weight', 'mass'), 33000 * LB, { rel: 1e-15 }, 'NIST SP 811 lb');
  });

  it('quantityOption without a fallback requires the option, with one takes it when absent', () => {
    expect(() => quantityOption({}, 'altitude', 'length')).toThrow(new UsageError('missing --altitude'));
    expect(() => quantityOption({ altitude: '  ' }, 'altitude', 'length')).toThrow(UsageError);
    expect(quantityOption({}, 'isa-dev', 'temperatureDelta', 7)).toBe(7);
  });

  it('quantityOption names the option and the dimension it expected', () => {
    expect(() => quantityOption({ altitude: '250 kt' }, 'altitude', 'length')).toThrow(/^--altitude: .*length/);
  });
});

describe('optionalQuantityOption', () => {
  it('optionalQuantityOption is undefined when absent and SI when given', () => {
    expect(optionalQuantityOption({}, 'bleed', 'dimensionless')).toBeUndefined();
    expectClose(optionalQuantityOption({ bleed: '1.5 %' }, 'bleed', 'dimensionless')!, 0.015, { rel: 1e-15 }, 'percent = 1/100');
  });
});

describe('positiveQuantityOption', () => {
  it('positiveQuantityOption refuses zero and negative values, naming the option', () => {
    expect(() => positiveQuantityOption({ weight: '0 kg' }, 'weight', 'mass')).toThrow(/^--weight: must be positive/);
    expect(() => positiveQuantityOption({ weight: '-5 kg' }, 'weight', 'mass')).toThrow(/^--weight: must be positive/);
    expect(positiveQuantityOption({ weight: '5 kg' }, 'weight', 'mass')).toBe(5);
  });
});
