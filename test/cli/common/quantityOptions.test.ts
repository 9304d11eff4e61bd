import { describe, expect, it } from 'vitest';
import { OPTION_RANGES, optionalQuantityOption, quantityOption } from '../../../cli/common/quantityOptions';
import { UsageError } from '../../../cli/verb';
import { expectClose } from '../../support/assertInDelta';

// NIST SP 811 (2008) B.8: 1 ft = 0.3048 m, 1 lb = 0.45359237 kg (exact).
const FT = 0.3048;
const LB = 0.45359237;
const R = OPTION_RANGES;

describe('quantityOption', () => {
  it('quantityOption converts the text to SI', () => {
    expectClose(quantityOption({ altitude: '35000 ft' }, 'altitude', 'length', R.flightAltitude), 35000 * FT, { rel: 1e-15 }, 'NIST SP 811 ft');
    expectClose(quantityOption({ weight: '33000 lb' }, 'weight', 'mass', R.aircraftMass), 33000 * LB, { rel: 1e-15 }, 'NIST SP 811 lb');
  });

  it('quantityOption without a fallback requires the option, with one takes it when absent', () => {
    expect(() => quantityOption({}, 'altitude', 'length', R.flightAltitude)).toThrow(new UsageError('missing --altitude'));
    expect(() => quantityOption({ altitude: '  ' }, 'altitude', 'length', R.flightAltitude)).toThrow(UsageError);
    expect(quantityOption({}, 'isa-dev', 'temperatureDelta', R.isaDeviation, 7)).toBe(7);
  });

  it('quantityOption names the option and the dimension it expected', () => {
    expect(() => quantityOption({ altitude: '250 kt' }, 'altitude', 'length', R.flightAltitude)).toThrow(/^--altitude: .*length/);
  });

  it('quantityOption refuses values outside the option range, naming the option and the range', () => {
    expect(() => quantityOption({ weight: '0 kg' }, 'weight', 'mass', R.aircraftMass)).toThrow(/^--weight: "0 kg" is out of range: expected a mass above 0/);
    expect(() => quantityOption({ weight: '-5 kg' }, 'weight', 'mass', R.aircraftMass)).toThrow(/^--weight: .*out of range/);
    expect(() => quantityOption({ weight: '2000000 kg' }, 'weight', 'mass', R.aircraftMass)).toThrow(/^--weight: .*at most 1,000,000 kg/);
    expect(() => quantityOption({ altitude: '-99999ft' }, 'altitude', 'length', R.flightAltitude)).toThrow(/^--altitude: "-99999ft" is out of range/);
    expect(quantityOption({ weight: '5 kg' }, 'weight', 'mass', R.aircraftMass)).toBe(5);
    // The bounds themselves are accepted (inclusive) unless the range says the minimum is excluded.
    expect(quantityOption({ mach: '5' }, 'mach', 'dimensionless', R.mach)).toBe(5);
    expect(quantityOption({ mach: '0' }, 'mach', 'dimensionless', R.mach)).toBe(0);
  });

  it('quantityOption refuses numbers no physical quantity has: 1e308 and subnormals', () => {
    expect(() => quantityOption({ weight: '1e308kg' }, 'weight', 'mass', R.aircraftMass)).toThrow(/^--weight: "1e308kg" is 1\.00e\+308 in SI units, beyond any physical value/);
    expect(() => quantityOption({ mach: '1e308' }, 'mach', 'dimensionless', R.mach)).toThrow(/^--mach: .*beyond any physical value/);
    expect(() => quantityOption({ mach: '5e-324' }, 'mach', 'dimensionless', R.mach)).toThrow(/^--mach: "5e-324" is a subnormal number/);
  });
});

describe('optionalQuantityOption', () => {
  it('optionalQuantityOption is undefined when absent and SI when given', () => {
    expect(optionalQuantityOption({}, 'bleed', 'dimensionless', R.fraction)).toBeUndefined();
    expectClose(optionalQuantityOption({ bleed: '1.5 %' }, 'bleed', 'dimensionless', R.fraction)!, 0.015, { rel: 1e-15 }, 'percent = 1/100');
  });
});
