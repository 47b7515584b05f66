/**
 * What the hunter has typed for the current note. A reducer, so the keypad, the hardware
 * keyboard and the tests all drive the same transitions.
 */
export interface SerialEntry {
  digits: string;
  star: boolean;
  pulled: boolean;
  /** Optional prefix letters (district read from the last one) typed in the quick fields. */
  prefix: string;
}

export type EntryAction =
  | { type: 'digit'; digit: string }
  | { type: 'delete' }
  | { type: 'clear' }
  | { type: 'toggle-star' }
  | { type: 'toggle-pulled' }
  | { type: 'set-prefix'; prefix: string }
  | { type: 'paste'; text: string }
  | { type: 'restore'; entry: SerialEntry };

export const SERIAL_LENGTH = 8;
export const emptyEntry: SerialEntry = { digits: '', star: false, pulled: false, prefix: '' };

export function entryReducer(state: SerialEntry, action: EntryAction): SerialEntry {
  switch (action.type) {
    case 'digit':
      if (!/^[0-9]$/.test(action.digit) || state.digits.length >= SERIAL_LENGTH) return state;
      return { ...state, digits: state.digits + action.digit };
    case 'delete':
      return { ...state, digits: state.digits.slice(0, -1) };
    case 'clear':
      // The prefix usually stays the same through a strap, so it survives clearing.
      return { ...emptyEntry, prefix: state.prefix };
    case 'toggle-star':
      return { ...state, star: !state.star };
    case 'toggle-pulled':
      return { ...state, pulled: !state.pulled };
    case 'set-prefix':
      return { ...state, prefix: action.prefix.toUpperCase().replace(/[^A-Z]/g, '').slice(0, 2) };
    case 'paste': {
      const digits = action.text.replace(/\D/g, '').slice(0, SERIAL_LENGTH);
      const star = /[*★]/.test(action.text) || state.star;
      return { ...state, digits, star };
    }
    case 'restore':
      return action.entry;
    default:
      return state;
  }
}

export const isComplete = (entry: SerialEntry) => entry.digits.length === SERIAL_LENGTH;

/** The text handed to the engine: prefix, digits and the star, as a hunter would write them. */
export function entryText(entry: SerialEntry): string {
  return `${entry.prefix ? `${entry.prefix} ` : ''}${entry.digits}${entry.star ? '*' : ''}`;
}
