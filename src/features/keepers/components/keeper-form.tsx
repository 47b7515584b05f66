import { StyleSheet, View } from 'react-native';
import { DENOMINATIONS } from '@shared/contracts';
import { DISTRICTS, SMALL_STAR_RUN } from '@shared/trade';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import type { KeeperDraft } from '../keeper-draft';
import { GradePicker } from './grade-picker';

const STATUS = [
  { value: 'kept', label: 'Kept' },
  { value: 'traded', label: 'Traded' },
  { value: 'sold', label: 'Sold' },
  { value: 'spent', label: 'Spent back' },
] as const;

const ORIGINAL_PAPER = [
  { value: '', label: 'Not judged' },
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
] as const;

const FACILITIES = [
  { value: '', label: 'Not checked' },
  { value: 'DC', label: 'Washington (no mark)' },
  { value: 'FW', label: 'Fort Worth (FW)' },
] as const;

/** Every field of a kept note; errors come from the same checks the server runs. */
export function KeeperForm({ draft, onChange, fields }: { draft: KeeperDraft; onChange(draft: KeeperDraft): void; fields: Record<string, string> }) {
  const { isTablet } = useLayout();
  const set = <K extends keyof KeeperDraft>(key: K, value: KeeperDraft[K]) => onChange({ ...draft, [key]: value });
  const district = DISTRICTS.find((item) => item.letter === draft.district.toUpperCase());
  return (
    <View style={styles.form} testID="keeper-form">
      <Field label="Serial" value={draft.serial} onChangeText={(text) => set('serial', text)} autoCapitalize="characters" placeholder="e.g. MB 12344321 ★" error={fields.serial} testID="keeper-serial" />
      <View style={[styles.row, !isTablet && styles.stack]}>
        <View style={styles.cell}>
          <Field label="Series" value={draft.series} onChangeText={(text) => set('series', text)} placeholder="e.g. 2017A" autoCapitalize="characters" error={fields.series} testID="keeper-series" />
        </View>
        <View style={styles.cell}>
          <Field
            label="District letter"
            value={draft.district}
            onChangeText={(text) => set('district', text.toUpperCase().slice(0, 1))}
            placeholder="A–L"
            autoCapitalize="characters"
            error={fields.district}
            hint={district ? `${district.number} · ${district.bank}` : undefined}
            testID="keeper-district"
          />
        </View>
      </View>
      <ChoiceRow label="Printing facility" options={FACILITIES} value={draft.facility} onChange={(value) => set('facility', value as KeeperDraft['facility'])} />
      <ChoiceRow
        label="Star (replacement) note"
        options={[
          { value: 'no', label: 'No' },
          { value: 'yes', label: '★ Star' },
        ]}
        value={draft.star ? 'yes' : 'no'}
        onChange={(value) => set('star', value === 'yes')}
      />
      {draft.star ? (
        <Field
          label="Star run size"
          value={draft.starRunSize}
          onChangeText={(text) => set('starRunSize', text)}
          inputMode="numeric"
          placeholder="as looked up, e.g. 640000"
          hint={`The run size you looked up; runs of ${SMALL_STAR_RUN.toLocaleString('en-US')} or fewer are small. No run data ships with Strapsift.`}
          error={fields.starRunSize}
          testID="keeper-star-run"
        />
      ) : null}
      <ChoiceRow
        label="Face value"
        options={DENOMINATIONS.map((value) => ({ value, label: `$${value}` }))}
        value={draft.denomination ?? 0}
        onChange={(value) => set('denomination', Number(value))}
      />
      <GradePicker value={draft.grade} onChange={(text) => set('grade', text)} error={fields.grade} />
      <ChoiceRow
        label="Original paper (never pressed, washed or repaired)"
        options={ORIGINAL_PAPER}
        value={draft.originalPaper}
        onChange={(value) => set('originalPaper', value as KeeperDraft['originalPaper'])}
        testID="keeper-original-paper"
      />
      <Field
        label="Your estimate ($)"
        value={draft.value}
        onChangeText={(text) => set('value', text)}
        inputMode="decimal"
        placeholder="e.g. 12.50"
        error={fields.estimatedValueCents}
        testID="keeper-value"
      />
      <Notice tone="caution">Values are your own estimates, not appraisals. Have valuable notes graded by a professional service.</Notice>
      <ChoiceRow label="What became of it" options={STATUS} value={draft.status} onChange={(value) => set('status', value as KeeperDraft['status'])} testID="keeper-status" />
      <Field label="Notes" value={draft.notes} onChangeText={(text) => set('notes', text)} multiline numberOfLines={3} error={fields.notes} style={styles.notes} testID="keeper-notes" />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  row: { flexDirection: 'row', gap: space.md },
  stack: { flexDirection: 'column' },
  cell: { flex: 1 },
  notes: { minHeight: 88, paddingTop: space.sm, textAlignVertical: 'top' },
});
