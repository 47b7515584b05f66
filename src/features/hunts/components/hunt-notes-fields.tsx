import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Text } from '@/components/ui/text';

export type NoteOrder = 'circulated' | 'sequence';

const NOTE_ORDER_CHOICES = [
  { value: 'circulated', label: 'Circulated, in no order' },
  { value: 'sequence', label: 'New, in sequence' },
] as const;

export const noteOrderOf = (inSequence: boolean): NoteOrder => (inSequence ? 'sequence' : 'circulated');

/** The series typed in a form, as the API takes it: upper case, or nothing when left empty. */
export const seriesOrNull = (text: string): string | null => (text.trim() ? text.trim().toUpperCase() : null);

interface HuntNotesFieldsProps {
  order: NoteOrder;
  onOrder(order: NoteOrder): void;
  series: string;
  onSeries(series: string): void;
  seriesError?: string;
  /** Prefix for the fields' test ids: `${prefix}-in-sequence`, `${prefix}-series`. */
  testPrefix: string;
}

/**
 * What a hunt's notes are: circulated or new in sequence (which decides how chance is computed) and the
 * series printed on them (which readings check serial formats against). Starting a hunt and editing
 * its details ask the same two questions.
 */
export function HuntNotesFields({ order, onOrder, series, onSeries, seriesError, testPrefix }: HuntNotesFieldsProps) {
  return (
    <>
      <ChoiceRow
        label="The notes are"
        options={NOTE_ORDER_CHOICES}
        value={order}
        onChange={(value) => onOrder(value === 'sequence' ? 'sequence' : 'circulated')}
        testID={`${testPrefix}-in-sequence`}
      />
      <Text variant="caption" tone="faint">
        New notes in sequence are compared with every run of the same length; circulated notes as independent draws.
      </Text>
      <Field
        label="Series on the notes (optional)"
        value={series}
        onChangeText={onSeries}
        placeholder="e.g. 2017A"
        autoCapitalize="characters"
        error={seriesError}
        testID={`${testPrefix}-series`}
      />
    </>
  );
}
