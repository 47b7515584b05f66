import { StyleSheet, View } from 'react-native';
import { IMPORT_FIELDS, type ImportField } from '@shared/contracts';
import type { ColumnMapping } from '@shared/transfer/import-log';
import { Button } from '@/components/ui/button';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Text } from '@/components/ui/text';
import { space } from '@/theme/tokens';

const FIELD_LABEL: Record<ImportField, string> = {
  serial: 'Serial (required)',
  date: 'Date',
  strap: 'Strap',
  series: 'Series',
  district: 'District',
  star: 'Star',
  pulled: 'Pulled',
  note: 'Note',
  entryMethod: 'Entered by (keypad or camera)',
  cameraConfidence: 'Camera confidence',
};

interface ImportColumnsProps {
  headers: string[];
  mapping: ColumnMapping;
  onChange(mapping: ColumnMapping): void;
  editing: boolean;
  onEditing(editing: boolean): void;
}

/** Which column of the file is which field: the guess in a line, and a picker per field to change it. */
export function ImportColumns({ headers, mapping, onChange, editing, onEditing }: ImportColumnsProps) {
  const open = editing || mapping.serial === null;
  const options = [{ value: -1, label: '—' }, ...headers.map((header, index) => ({ value: index, label: header || `column ${index + 1}` }))];
  return (
    <>
      <Text variant="label" tone="muted">
        WHICH COLUMN IS WHICH
      </Text>
      <View style={styles.row}>
        <Text style={styles.grow} testID="import-columns">
          {IMPORT_FIELDS.filter((field) => mapping[field] !== null)
            .map((field) => `${FIELD_LABEL[field].replace(' (required)', '')} ← “${headers[mapping[field]!] || `column ${mapping[field]! + 1}`}”`)
            .join(' · ') || 'No column is matched yet.'}
        </Text>
        <Button compact kind="quiet" label={open ? 'Done' : 'Change columns'} onPress={() => onEditing(!editing)} testID="import-edit-columns" />
      </View>
      {(open ? IMPORT_FIELDS : []).map((field) => (
        <ChoiceRow
          key={field}
          label={FIELD_LABEL[field]}
          options={options}
          value={mapping[field] ?? -1}
          onChange={(value) => onChange({ ...mapping, [field]: value === -1 ? null : value })}
          testID={`import-map-${field}`}
        />
      ))}
    </>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.md, alignItems: 'center', flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 200 },
});
