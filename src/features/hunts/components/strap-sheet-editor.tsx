import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { StrapRow, StrapSheet, UpdateStrapRequest } from '@shared/contracts';
import { balanceOf, strapStatus, strapsBackLine } from '@shared/straps';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { ApiError } from '@/lib/api/api-error';
import { useTheme } from '@/theme/theme-provider';
import { radius, space } from '@/theme/tokens';
import { formatCount } from '@/lib/format';
import {
  BALANCE_TONE,
  draftFrom,
  isTouched,
  parseStrapDraft,
  previewBack,
  previewTone,
  readWhole,
  signed,
  type StrapDraft,
  type StrapDraftField,
} from '../strap-draft';

interface StrapSheetEditorProps {
  sheet: StrapSheet;
  /** Sends the change; throws an ApiError the editor shows beside the fields it names. */
  onSave(strap: number, body: UpdateStrapRequest): Promise<unknown>;
  canEdit: boolean;
  wide: boolean;
}

interface Editing {
  strap: number;
  draft: StrapDraft;
  errors: Partial<Record<StrapDraftField, string>>;
  message: string | null;
  busy: boolean;
}

function StateBadge({ row }: { row: StrapRow }) {
  const status = strapStatus(row);
  return <Badge label={status.label} tone={BALANCE_TONE[status.balance]} accessibilityLabel={`Strap ${row.number}: ${status.label}`} />;
}

function Searched({ row }: { row: StrapRow }) {
  return (
    <Text variant="mono" tone={row.fullySearched || row.searched === 0 ? 'ink' : 'muted'} numberOfLines={1}>
      {row.searched}
      <Text variant="caption" tone="faint">
        {' '}
        / {row.received}
      </Text>
    </Text>
  );
}

/** A number field with − and + beside it: a thumb corrects a count without the keyboard. */
function Stepper({
  label,
  value,
  onChange,
  error,
  hint,
  testID,
  allowNegative,
}: {
  label: string;
  allowNegative?: boolean;
  value: string;
  onChange(next: string): void;
  error?: string;
  hint?: string;
  testID: string;
}) {
  const step = (by: number) => {
    const current = readWhole(value);
    const next = (Number.isNaN(current) ? 0 : current) + by;
    onChange(allowNegative ? signed(next) : String(Math.max(0, next)));
  };
  return (
    <View style={styles.stepper}>
      <View style={styles.stepperField}>
        <Field
          label={label}
          value={value}
          onChangeText={onChange}
          error={error}
          hint={hint}
          keyboardType="numbers-and-punctuation"
          selectTextOnFocus
          testID={testID}
        />
      </View>
      <View style={styles.stepButtons}>
        <Button kind="secondary" compact label="−" accessibilityLabel={`${label}: one less`} onPress={() => step(-1)} style={styles.stepButton} />
        <Button kind="secondary" compact label="+" accessibilityLabel={`${label}: one more`} onPress={() => step(1)} style={styles.stepButton} />
      </View>
    </View>
  );
}

function StrapForm({
  row,
  editing,
  setDraft,
  onSave,
  onCancel,
}: {
  row: StrapRow;
  editing: Editing;
  setDraft(change: Partial<StrapDraft>): void;
  onSave(): void;
  onCancel(): void;
}) {
  const theme = useTheme();
  const preview = previewBack(row, editing.draft);
  const n = row.number;
  return (
    <View
      role="form"
      aria-label={`Strap ${n}`}
      testID={`strap-form-${n}`}
      style={[styles.form, { backgroundColor: theme.surfaceSunken, borderColor: theme.line }]}
    >
      <Text variant="label">
        Strap {n}: {row.pulled} pulled of {row.searched} searched
      </Text>
      {editing.message ? <Notice tone="error">{editing.message}</Notice> : null}
      <View style={styles.formFields}>
        <Stepper
          label="Swapped in"
          value={editing.draft.swappedIn}
          onChange={(swappedIn) => setDraft({ swappedIn })}
          error={editing.errors.swappedIn}
          hint="Notes from your own cash put in for pulled ones"
          testID={`strap-swapped-${n}`}
        />
        <Stepper
          label="Short or over"
          value={editing.draft.shortOver}
          onChange={(shortOver) => setDraft({ shortOver })}
          error={editing.errors.shortOver}
          hint="As it came from the bank: −1 one short, +1 one over"
          allowNegative
          testID={`strap-short-over-${n}`}
        />
      </View>
      {row.pulled > 0 && editing.draft.swappedIn !== String(row.pulled) ? (
        <Button
          kind="quiet"
          compact
          label={`Swap in as many as pulled (${row.pulled})`}
          onPress={() => setDraft({ swappedIn: String(row.pulled) })}
          style={styles.alignStart}
        />
      ) : null}
      <Field
        label="Note"
        value={editing.draft.note}
        onChangeText={(note) => setDraft({ note })}
        error={editing.errors.note}
        placeholder="e.g. teller recounted"
        testID={`strap-note-${n}`}
      />
      <Text
        testID={`strap-preview-${n}`}
        tone={preview ? previewTone(preview.notesBack) : 'faint'}
        accessibilityLiveRegion="polite"
        aria-live="polite"
      >
        {preview
          ? `Goes back with ${preview.notesBack} notes: ${balanceOf(preview.notesBack).label}`
          : 'Type whole numbers to see what the strap goes back with.'}
      </Text>
      <View style={styles.formActions}>
        <Button label="Save strap" busy={editing.busy} onPress={onSave} testID={`strap-save-${n}`} />
        <Button kind="secondary" label="Cancel" onPress={onCancel} disabled={editing.busy} testID={`strap-cancel-${n}`} />
      </View>
    </View>
  );
}

/**
 * The strap sheet: per strap, notes searched, pulled, swapped in, short or over, and what goes back to
 * the teller. Swaps and short/over counts are edited in place; a failed save keeps what was typed.
 */
export function StrapSheetEditor({ sheet, onSave, canEdit, wide }: StrapSheetEditorProps) {
  const theme = useTheme();
  const [editing, setEditing] = useState<Editing | null>(null);
  const [showAll, setShowAll] = useState(false);

  const touched = sheet.straps.filter(isTouched);
  const hidden = sheet.straps.length - touched.length;
  // Untouched straps are folded away on a long sheet, but the one being edited always shows.
  const rows = showAll || hidden <= 3 ? sheet.straps : sheet.straps.filter((row) => isTouched(row) || row.number === editing?.strap);

  const open = (row: StrapRow) => setEditing({ strap: row.number, draft: draftFrom(row), errors: {}, message: null, busy: false });
  const setDraft = (change: Partial<StrapDraft>) =>
    setEditing((current) => (current ? { ...current, draft: { ...current.draft, ...change }, errors: {} } : current));

  const save = async () => {
    if (!editing) return;
    const parsed = parseStrapDraft(editing.draft);
    if (!parsed.ok) {
      setEditing({ ...editing, errors: parsed.errors, message: null });
      return;
    }
    setEditing({ ...editing, busy: true, message: null });
    try {
      await onSave(editing.strap, parsed.body);
      setEditing(null);
    } catch (error) {
      const fields = error instanceof ApiError ? error.fields : {};
      const message = error instanceof ApiError ? error.message : 'The strap could not be saved; please try again.';
      setEditing((current) => (current ? { ...current, busy: false, message, errors: fields as Editing['errors'] } : current));
    }
  };

  const form = (row: StrapRow) =>
    editing?.strap === row.number ? (
      <StrapForm row={row} editing={editing} setDraft={setDraft} onSave={() => void save()} onCancel={() => setEditing(null)} />
    ) : null;

  const editButton = (row: StrapRow) =>
    canEdit && editing?.strap !== row.number ? (
      <Button
        kind="secondary"
        compact
        label="Edit"
        accessibilityLabel={`Edit strap ${row.number}`}
        onPress={() => open(row)}
        testID={`strap-edit-${row.number}`}
      />
    ) : null;

  const columns: Column<StrapRow>[] = [
    { key: 'number', header: 'Strap', width: 64, cell: (row) => <Text bold>{row.number}</Text> },
    { key: 'searched', header: 'Searched', align: 'right', width: 104, cell: (row) => <Searched row={row} /> },
    { key: 'pulled', header: 'Pulled', align: 'right', width: 72, cell: (row) => row.pulled },
    { key: 'swapped', header: 'Swapped in', align: 'right', width: 100, cell: (row) => row.swappedIn },
    { key: 'shortOver', header: 'Short/over', align: 'right', width: 96, cell: (row) => <Text variant="mono">{signed(row.shortOver)}</Text> },
    {
      key: 'back',
      header: 'Goes back',
      align: 'right',
      width: 96,
      cell: (row) => (
        <Text variant="mono" bold testID={`strap-back-${row.number}`}>
          {row.notesBack}
        </Text>
      ),
    },
    { key: 'state', header: 'State', flex: 1.2, cell: (row) => <StateBadge row={row} /> },
    { key: 'note', header: 'Note', flex: 1.6, cell: (row) => <Text variant="caption" tone="muted" numberOfLines={2}>{row.note ?? ''}</Text> },
    ...(canEdit ? [{ key: 'edit', header: '', width: 88, align: 'right' as const, cell: (row: StrapRow) => editButton(row) }] : []),
  ];

  const totals = sheet.totals;
  return (
    <View style={styles.wrap} testID="strap-sheet">
      {wide ? (
        <DataTable
          label={`Strap sheet, ${sheet.straps.length} straps`}
          columns={columns}
          rows={rows}
          rowKey={(row) => String(row.number)}
          highlight={(row) => isTouched(row) && !row.complete}
          below={form}
        />
      ) : (
        <View role="list" aria-label={`Strap sheet, ${sheet.straps.length} straps`} style={styles.cards}>
          {rows.map((row) => (
            <View
              key={row.number}
              role="listitem"
              testID={`strap-row-${row.number}`}
              style={[styles.card, { borderColor: theme.line, backgroundColor: theme.surfaceRaised }]}
            >
              <View style={styles.cardHead}>
                <Text bold>Strap {row.number}</Text>
                {/* The badge sits at its row's top by default; here it centres with the title and the button. */}
                <View>
                  <StateBadge row={row} />
                </View>
                <View style={styles.grow} />
                <Text variant="caption" tone="muted">
                  back{' '}
                  <Text variant="mono" bold testID={`strap-back-${row.number}`}>
                    {row.notesBack}
                  </Text>
                </Text>
                {editButton(row)}
              </View>
              <View style={styles.cardFigures}>
                <Text variant="caption" tone="muted">
                  searched <Searched row={row} />
                </Text>
                <Text variant="caption" tone="muted">
                  pulled <Text variant="mono">{row.pulled}</Text>
                </Text>
                <Text variant="caption" tone="muted">
                  in <Text variant="mono">{row.swappedIn}</Text>
                </Text>
                <Text variant="caption" tone="muted">
                  ± <Text variant="mono">{signed(row.shortOver)}</Text>
                </Text>
              </View>
              {row.note ? (
                <Text variant="caption" tone="faint">
                  {row.note}
                </Text>
              ) : null}
              {form(row)}
            </View>
          ))}
        </View>
      )}
      {hidden > 3 ? (
        <Button
          kind="quiet"
          compact
          label={showAll ? 'Hide straps not started' : `Show ${hidden} straps not started yet`}
          onPress={() => setShowAll((value) => !value)}
          style={styles.alignStart}
          testID="strap-show-all"
        />
      ) : null}
      <Text tone="muted" testID="strap-totals">
        {formatCount(totals.searched)} searched · {formatCount(totals.pulled)} pulled · {formatCount(totals.swappedIn)} swapped in ·{' '}
        {formatCount(totals.notesBack)} notes back · {strapsBackLine(sheet.straps)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  cards: { gap: space.sm },
  card: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  cardHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  cardFigures: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: 2 },
  grow: { flex: 1 },
  form: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.md, marginTop: space.xs },
  formFields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  formActions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  stepper: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xs, flexGrow: 1, flexBasis: 240 },
  stepperField: { flex: 1 },
  stepButtons: { flexDirection: 'row', gap: space.xs, marginTop: 22 },
  stepButton: { minWidth: 44, minHeight: 48 },
  alignStart: { alignSelf: 'flex-start' },
});
