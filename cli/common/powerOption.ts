/** The `--power` option of the deck verbs: a number on the deck's power axis, or a rating name. */
import { RATING_NAMES, type RatingName } from '../../engine/propulsion';
import { parseQuantity } from '../../engine/units';
import { UsageError } from '../verb';

export type PowerChoice = { readonly kind: 'rating'; readonly rating: RatingName } | { readonly kind: 'power'; readonly power: number };

/** Reads `--power` text: a rating name (exact spelling) or a number; a UsageError names both choices. */
export function powerOrRating(text: string): PowerChoice {
  const trimmed = text.trim();
  const rating = RATING_NAMES.find((r) => r === trimmed);
  if (rating !== undefined) return { kind: 'rating', rating };
  const parsed = parseQuantity(trimmed, 'dimensionless');
  if (!parsed.ok) throw new UsageError(`--power: "${trimmed}" is neither a number nor a rating (${RATING_NAMES.join(', ')})`);
  return { kind: 'power', power: parsed.value };
}
