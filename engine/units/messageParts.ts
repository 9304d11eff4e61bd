/**
 * Messages that carry their numbers as quantities (SI value and kind), so each
 * caller formats them once in the units its reader chose: the renderer in the
 * display unit system, the CLI in customary with SI. A message is a list of
 * text parts and quantity parts, written with the `msg` tag:
 *
 *   msg`Take-off mass ${q(m_kg, 'mass')} is above the limit ${q(mtow_kg, 'mass')}.`
 *
 * Plain strings and numbers in the template stay text (leg names, counts).
 */
import type { UnitSystem } from './dimension';
import { formatQuantity, groupDigits, type DisplayKind } from './displayUnits';
import { fromSi } from './quantity';

/** Kinds a message quantity may have: a display kind or a plain number of the trade. */
export type MessageKind = DisplayKind | 'mach' | 'coefficient' | 'loadFactor' | 'ratio' | 'airflow';

export interface MessageQuantity {
  /** SI value (plain numbers as they are). */
  readonly value_si: number;
  readonly kind: MessageKind;
}

export type MessagePart = string | MessageQuantity;
export type MessageParts = readonly MessagePart[];

/** A quantity part: SI value and its kind. */
export function q(value_si: number, kind: MessageKind): MessageQuantity {
  return { value_si, kind };
}

/** Builds message parts from a template; `${q(...)}` values are quantities, others become text. */
export function msg(strings: TemplateStringsArray, ...values: readonly (MessagePart | MessageParts | number)[]): MessageParts {
  const parts: MessagePart[] = [];
  const pushText = (text: string) => {
    if (text === '') return;
    const last = parts[parts.length - 1];
    if (typeof last === 'string') parts[parts.length - 1] = last + text;
    else parts.push(text);
  };
  strings.forEach((s, k) => {
    pushText(s);
    if (k < values.length) {
      const v = values[k]!;
      if (Array.isArray(v)) {
        for (const p of v as MessageParts) {
          if (typeof p === 'string') pushText(p);
          else parts.push(p);
        }
      }
      else if (typeof v === 'object') parts.push(v as MessageQuantity);
      else pushText(String(v));
    }
  });
  return parts;
}

const PLAIN_DIGITS: Readonly<Record<Exclude<MessageKind, DisplayKind | 'airflow'>, number>> = {
  mach: 3,
  coefficient: 3,
  loadFactor: 2,
  ratio: 3,
};

/**
 * How a message is written: in one unit system, or `both` (customary with SI
 * in parentheses, "35,000 ft (10,668 m)"), the engine's own text for readers
 * that chose no units (the CLI, logs).
 */
export type MessageUnits = UnitSystem | 'both';

/** One quantity as text ("35,000 ft"; a Mach number "0.780"; a load factor "1.30 g"). */
export function formatMessageQuantity(part: MessageQuantity, system: MessageUnits): string {
  if (!Number.isFinite(part.value_si)) return '—';
  if (system === 'both') {
    const customary = formatMessageQuantity(part, 'customary');
    const si = formatMessageQuantity(part, 'si');
    return customary === si ? si : `${customary} (${si})`;
  }
  switch (part.kind) {
    case 'mach':
    case 'coefficient':
      return groupDigits(part.value_si, PLAIN_DIGITS[part.kind]);
    case 'ratio': {
      const text = groupDigits(part.value_si, PLAIN_DIGITS.ratio);
      return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
    }
    case 'airflow':
      return system === 'si' ? `${groupDigits(part.value_si, 2)} kg/s` : `${groupDigits(fromSi(part.value_si, 'lb/s'), 1)} lb/s`;
    case 'loadFactor':
      return `${groupDigits(part.value_si, PLAIN_DIGITS.loadFactor)} g`;
    default:
      return formatQuantity(part.value_si, part.kind, system);
  }
}

/** The message as text in a unit system. */
export function messageText(parts: MessageParts, system: MessageUnits): string {
  return parts.map((p) => (typeof p === 'string' ? p : formatMessageQuantity(p, system))).join('');
}

/** Something that carries a message and, where its numbers are quantities, their parts. */
export interface WithMessage {
  readonly message: string;
  readonly parts?: MessageParts;
}

/** The text of a message in a unit system: its parts formatted when it has them, else its text as written. */
export function messageIn(subject: WithMessage, system: MessageUnits): string {
  return subject.parts === undefined ? subject.message : messageText(subject.parts, system);
}

/** A message's SI text and its parts together, to spread into a caution or an outcome. */
export function withParts(parts: MessageParts): { readonly message: string; readonly parts: MessageParts } {
  return { message: messageText(parts, 'both'), parts };
}

/** The parts of a message (its text as one part when it has none). */
export function partsOf(subject: WithMessage): MessageParts {
  return subject.parts ?? (subject.message === '' ? [] : [subject.message]);
}
