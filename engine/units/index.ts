/**
 * engine/units's public surface (hand-written; docs/style.md §5): parsing and
 * formatting quantities in the user's unit system, and the few conversion
 * factors other layers need by name (every factor lives in unitTable.ts).
 */
export { displayUnit, formatQuantity, groupDigits, toDisplay, type DisplayKind } from './displayUnits';
export { fromSi, parseQuantity, type Dimension, type UnitSystem } from './quantity';
export { messageIn, messageText } from './messageParts';
export { FOOT_M, INCH_M, NAUTICAL_MILE_M, POUND_FORCE_N, POUND_KG } from './unitTable';
