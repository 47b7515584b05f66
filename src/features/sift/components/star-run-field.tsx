import { Field } from '@/components/ui/field';
import { SMALL_STAR_RUN } from '@shared/trade';

/**
 * The run size a hunter looked up for a star note, as typed: digits with optional separators.
 * Null when empty or not a whole number of notes; the app ships no run data.
 *
 * @example
 * parseStarRun('640,000') // 640000
 */
export function parseStarRun(text: string): number | null {
  const digits = text.replace(/[\s,._]/g, '');
  if (!/^\d{1,9}$/.test(digits)) return null;
  const value = Number(digits);
  return value >= 1 && value <= 100_000_000 ? value : null;
}

/** Shown while the star is on: where the hunter records the run size they looked up. */
export function StarRunField({ value, onChange }: { value: string; onChange(text: string): void }) {
  const invalid = value.trim() !== '' && parseStarRun(value) === null;
  return (
    <Field
      label="Star run size"
      value={value}
      onChangeText={onChange}
      keyboardType="number-pad"
      placeholder="as looked up, e.g. 640000"
      hint={`Look the run up before the note goes back: runs of ${SMALL_STAR_RUN.toLocaleString('en-US')} or fewer are small.`}
      error={invalid ? 'must be a whole number of notes' : undefined}
      testID="star-run-size"
    />
  );
}
