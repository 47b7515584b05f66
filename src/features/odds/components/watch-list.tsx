import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { parseWatchPattern, WATCH_SYNTAX } from '@shared/engine';
import type { WatchView } from '@shared/contracts';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useTheme } from '@/theme/theme-provider';
import { fonts, space } from '@/theme/tokens';
import { createWatch, deleteWatch } from '../api';

const EXAMPLES = ['0704????', '19??1999', '1000-1999', 'date:2019-06-14'];

/** The hunter's own patterns: birthdays, years, favourite numbers; checked by the engine as they type. */
export function WatchList({ items }: { items: WatchView[] }) {
  const theme = useTheme();
  const [pattern, setPattern] = useState('');
  const [label, setLabel] = useState('');
  const live = pattern.trim() ? parseWatchPattern(pattern) : null;
  const { submit, busy, message, fields } = useSubmit(async () => {
    await createWatch({ pattern: pattern.trim(), label: label.trim() || null });
    setPattern('');
    setLabel('');
  });
  const remove = useSubmit(async (id: string) => deleteWatch(id));

  return (
    <View style={styles.wrap} testID="watch-list">
      {items.length === 0 ? (
        <Text tone="muted">No watch patterns yet. Add a birthday, a year or a favourite number below.</Text>
      ) : (
        items.map((item) => (
          <View key={item.id} style={[styles.item, { borderBottomColor: theme.line }]}>
            <Text style={styles.mono}>{item.text}</Text>
            <Text tone="muted" style={styles.grow}>
              {item.label ?? ''}
            </Text>
            <Button compact kind="quiet" label="Remove" accessibilityLabel={`Remove watch pattern ${item.text}`} onPress={() => void remove.submit(item.id)} />
          </View>
        ))
      )}
      {message || remove.message ? <Notice tone="error">{message ?? remove.message ?? ''}</Notice> : null}
      <View style={styles.form}>
        <View style={styles.grow}>
          <Field
            label="Pattern"
            value={pattern}
            onChangeText={setPattern}
            placeholder="e.g. 0704????"
            autoCapitalize="none"
            error={fields.pattern ?? (live && !live.ok ? live.error.message : undefined)}
            hint={live?.ok ? 'Looks right.' : undefined}
            testID="watch-pattern"
          />
        </View>
        <View style={styles.grow}>
          <Field label="Label (optional)" value={label} onChangeText={setLabel} placeholder="e.g. Gran's birthday" error={fields.label} testID="watch-label" />
        </View>
      </View>
      <View style={styles.examples}>
        <Text variant="caption" tone="muted">
          Examples:
        </Text>
        {EXAMPLES.map((example) => (
          <Pressable key={example} accessibilityRole="button" accessibilityLabel={`Use example ${example}`} onPress={() => setPattern(example)}>
            <Text variant="caption" tone="brand" style={styles.mono}>
              {example}
            </Text>
          </Pressable>
        ))}
      </View>
      <Button label="Add watch pattern" busy={busy} disabled={!live?.ok} onPress={() => void submit()} testID="add-watch" />
      <Text variant="caption" tone="faint">
        {WATCH_SYNTAX}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.xs, borderBottomWidth: StyleSheet.hairlineWidth },
  mono: { fontFamily: fonts.mono },
  grow: { flex: 1, minWidth: 180 },
  form: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  examples: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' },
});
