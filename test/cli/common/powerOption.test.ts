import { describe, expect, it } from 'vitest';
import { powerOrRating } from '../../../cli/common/powerOption';
import { UsageError } from '../../../cli/verb';
import { RATING_NAMES } from '../../../engine/propulsion/propulsionModel';

describe('powerOrRating', () => {
  it('powerOrRating reads every rating name as a rating', () => {
    for (const name of RATING_NAMES) expect(powerOrRating(` ${name} `)).toEqual({ kind: 'rating', rating: name });
  });

  it('powerOrRating reads a number as a power-axis value', () => {
    expect(powerOrRating('0.85')).toEqual({ kind: 'power', power: 0.85 });
  });

  it('powerOrRating refuses anything else, listing the ratings', () => {
    expect(() => powerOrRating('maxclimb')).toThrow(UsageError);
    expect(() => powerOrRating('full')).toThrow(new RegExp(`neither a number nor a rating \\(${RATING_NAMES.join(', ')}\\)`));
  });
});
