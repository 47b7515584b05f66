import { useCallback, useEffect, useMemo, useReducer, useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useFocusEffect } from 'expo-router';
import { read } from '@shared/engine';
import { districtByLetter } from '@shared/trade';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { PageHeading } from '@/components/ui/page-heading';
import { Text } from '@/components/ui/text';
import { uuid } from '@/lib/uuid';
import { useScanQueue } from '@/lib/storage/use-scan-queue';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { radius, space } from '@/theme/tokens';
import { useStrapSheet } from '../hunts/api';
import { createKeeper } from '../keepers/api';
import { useActiveWeights, useWatchForReading } from '../odds/api';
import { DigitCells } from './components/digit-cells';
import { HuntChooser } from './components/hunt-chooser';
import { Keypad } from './components/keypad';
import { ReadingPanel } from './components/reading-panel';
import { StrapBar } from './components/strap-bar';
import { SyncBadge } from './components/sync-badge';
import { Trail } from './components/trail';
import { markEighthKey, measureReadingPainted } from './paint-timing';
import { nearMissLines } from './reading-view';
import { emptyEntry, entryReducer, isComplete, SERIAL_LENGTH } from './serial-entry';
import type { TrailNote } from './strap-count';
import { KEY_HINTS, useHardwareKeys } from './use-hardware-keys';
import { useSiftSession } from './use-sift-session';

export function SiftScreen() {
  const theme = useTheme();
  const { isWide } = useLayout();
  const weights = useActiveWeights();
  const watch = useWatchForReading();
  const { queue, snapshot } = useScanQueue();
  const [choosing, setChoosing] = useState(false);
  const [entry, dispatch] = useReducer(entryReducer, emptyEntry);
  const [flash, setFlash] = useState<{ tone: 'ok' | 'error' | 'info'; text: string } | null>(null);

  const [sheetHuntId, setSheetHuntId] = useState<string | null>(null);
  const sheetQuery = useStrapSheet(sheetHuntId);
  const sheetStart = sheetQuery.data ?? (sheetQuery.error && sheetHuntId ? { huntId: sheetHuntId, straps: [] } : undefined);
  const session = useSiftSession(sheetStart);
  useEffect(() => setSheetHuntId(session.huntId), [session.huntId]);
  const reloadSession = session.reload;
  useFocusEffect(
    useCallback(() => {
      void reloadSession();
      setChoosing(false);
    }, [reloadSession]),
  );

  // The reading is the engine's, on the device: no request stands between the eighth key and the verdict.
  const reading = useMemo(
    () =>
      isComplete(entry)
        ? read(`${entry.prefix}${entry.digits}`, { weights, watch, star: entry.star, denomination: session.hunt?.denomination })
        : null,
    [entry, weights, watch, session.hunt?.denomination],
  );
  useEffect(() => {
    if (reading) measureReadingPainted();
  }, [reading]);

  const typeDigit = useCallback(
    (digit: string) => {
      if (entry.digits.length === SERIAL_LENGTH - 1) markEighthKey();
      dispatch({ type: 'digit', digit });
    },
    [entry.digits.length],
  );

  const logNote = useCallback(async () => {
    if (!reading || !reading.ok || !queue || !session.count || !session.hunt) return;
    const id = uuid();
    const now = new Date().toISOString();
    const strap = session.count.strap;
    await queue.add({ id, huntId: session.hunt.id, strap, serial: `${entry.prefix}${entry.digits}`, star: reading.star, pulled: entry.pulled, scannedAt: now });
    const completed = await session.log({
      id,
      strap,
      digits: entry.digits,
      prefix: entry.prefix,
      star: reading.star,
      pulled: entry.pulled,
      patterns: reading.patterns,
      points: reading.score.points,
      keep: reading.score.keep,
      loggedAt: now,
    });
    dispatch({ type: 'clear' });
    setFlash(completed ? { tone: 'ok', text: `Strap ${completed} done: 100 notes searched. Band it; strap ${completed + 1} is next.` } : null);
  }, [reading, queue, session, entry]);

  const undoLast = useCallback(async () => {
    if (!queue) return;
    const removed = await session.undo();
    if (removed) {
      await queue.undo(removed.id);
      setFlash({ tone: 'info', text: `Took back ${removed.digits} from strap ${removed.strap}.` });
    }
  }, [queue, session]);

  const addToKeepers = useCallback(
    async (note: TrailNote) => {
      try {
        await queue?.flush();
        await createKeeper({ scanId: note.id, status: 'kept' });
        await session.markPulledHandled(note.id);
        setFlash({ tone: 'ok', text: `${note.digits} is in your keepers.` });
      } catch {
        setFlash({ tone: 'error', text: 'Could not add it yet; the note is safe on this device. Try again when online.' });
      }
    },
    [queue, session],
  );

  useHardwareKeys(
    {
      onDigit: typeDigit,
      onDelete: () => dispatch({ type: 'delete' }),
      onLog: () => void logNote(),
      onToggleStar: () => dispatch({ type: 'toggle-star' }),
      onTogglePulled: () => dispatch({ type: 'toggle-pulled' }),
      onUndo: () => void undoLast(),
    },
    !!session.hunt && !choosing,
  );

  if (!session.loaded) return <View role="main" style={[styles.root, { backgroundColor: theme.surface }]} />;

  if (!session.hunt || choosing) {
    return (
      <View role="main" style={[styles.root, { backgroundColor: theme.surface }]}>
        <ScrollView contentContainerStyle={[styles.chooser, isWide && styles.chooserWide]}>
          <PageHeading>Sift</PageHeading>
          <Text tone="muted">Pick the hunt these notes belong to. Every note is saved on this device first, then sent.</Text>
          <HuntChooser
            onChosen={(hunt) => {
              setChoosing(false);
              void session.selectHunt({ id: hunt.id, title: hunt.title, denomination: hunt.denomination });
            }}
            onCancel={session.hunt ? () => setChoosing(false) : undefined}
          />
        </ScrollView>
      </View>
    );
  }

  const misses = reading && reading.ok ? nearMissLines(reading) : [];
  const district = entry.prefix ? districtByLetter(entry.prefix[entry.prefix.length - 1]) : null;
  const count = session.count;

  const header = (
    <View style={styles.header}>
      <PageHeading hidden>{`Sift: ${session.hunt.title}`}</PageHeading>
      <View style={styles.headerTop}>
        <Button compact kind="quiet" label={`${session.hunt.title} ▾`} accessibilityLabel={`Hunt: ${session.hunt.title}. Switch hunt`} onPress={() => setChoosing(true)} testID="switch-hunt" />
        <SyncBadge snapshot={snapshot} onRetry={() => queue?.retryNow()} />
      </View>
      <View style={styles.headerTop}>
        {count ? (
          <StrapBar
            strap={count.strap}
            inStrap={count.inStrap}
            onPrevious={() => void session.moveToStrap(count.strap - 1)}
            onNext={() => void session.moveToStrap(count.strap + 1)}
          />
        ) : (
          <Text variant="caption" tone="faint">
            Finding your place in this hunt…
          </Text>
        )}
        <Button compact kind="secondary" label="Undo" accessibilityLabel="Undo the last note" onPress={() => void undoLast()} disabled={!count?.trail.length} testID="undo" />
      </View>
    </View>
  );

  const entryArea = (
    <View style={styles.entry}>
      <DigitCells digits={entry.digits} prefix={entry.prefix} star={entry.star} highlight={misses[0]?.distance === 1 ? misses[0].positions : []} hit={!!reading?.ok && reading.patterns.length > 0} />
      <View style={styles.quick}>
        <Field
          label="Prefix"
          value={entry.prefix}
          onChangeText={(prefix) => dispatch({ type: 'set-prefix', prefix })}
          autoCapitalize="characters"
          maxLength={2}
          placeholder="e.g. MB"
          style={styles.prefixInput}
          testID="prefix"
        />
        <Text variant="caption" tone="muted" style={styles.quickText}>
          {district ? `District ${district.letter} · ${district.number} · ${district.bank}` : 'Letters before the digits: the last one is the district.'}
        </Text>
      </View>
    </View>
  );

  const keypad = (
    <Keypad
      onDigit={typeDigit}
      onDelete={() => dispatch({ type: 'delete' })}
      onLog={() => void logNote()}
      onToggleStar={() => dispatch({ type: 'toggle-star' })}
      onTogglePulled={() => dispatch({ type: 'toggle-pulled' })}
      star={entry.star}
      pulled={entry.pulled}
      canLog={!!reading?.ok && !!count}
      canDelete={entry.digits.length > 0}
      showShortcuts={isWide}
    />
  );

  const notice = flash ? <Notice tone={flash.tone === 'error' ? 'error' : flash.tone === 'ok' ? 'ok' : 'info'}>{flash.text}</Notice> : null;
  const rejected = snapshot.rejected.length ? (
    <Notice tone="error" title="Notes the server refused">
      {snapshot.rejected.map((item) => `${item.scan.serial}: ${item.error}`).join('\n')}
    </Notice>
  ) : null;

  if (isWide) {
    return (
      <View role="main" style={[styles.root, styles.wideRoot, { backgroundColor: theme.surface }]}>
        <View style={styles.wideLeft}>
          {header}
          {entryArea}
          {keypad}
          <Text variant="caption" tone="faint">
            Keyboard: digits · {KEY_HINTS.delete} · {KEY_HINTS.log} logs · {KEY_HINTS.star} star · {KEY_HINTS.pull} pull · {KEY_HINTS.undo} undo
          </Text>
        </View>
        <ScrollView style={[styles.wideRight, { borderLeftColor: theme.line }]} contentContainerStyle={styles.wideRightContent}>
          {notice}
          {rejected}
          <View style={[styles.readingCard, { backgroundColor: theme.surfaceRaised, borderColor: theme.line }]}>
            <ReadingPanel digits={entry.digits} reading={reading} weights={weights} />
          </View>
          <Text variant="label" tone="muted">
            LAST NOTES
          </Text>
          <Trail notes={count?.trail ?? []} onAddToKeepers={(note) => void addToKeepers(note)} />
        </ScrollView>
      </View>
    );
  }

  return (
    <View role="main" style={[styles.root, { backgroundColor: theme.surface }]}>
      <View style={styles.phoneTop}>
        {header}
        {entryArea}
      </View>
      <ScrollView style={styles.phoneReading} contentContainerStyle={styles.phoneReadingContent}>
        {notice}
        {rejected}
        <ReadingPanel digits={entry.digits} reading={reading} weights={weights} compact />
        {!entry.digits ? <Trail notes={count?.trail ?? []} onAddToKeepers={(note) => void addToKeepers(note)} limit={3} /> : null}
      </ScrollView>
      <View style={[styles.phoneKeypad, { borderTopColor: theme.line, backgroundColor: theme.surfaceSunken }]}>{keypad}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  chooser: { padding: space.lg, gap: space.md, maxWidth: 560, width: '100%', alignSelf: 'center' },
  chooserWide: { paddingTop: space.xxl },
  header: { gap: space.sm },
  headerTop: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  entry: { gap: space.sm },
  quick: { flexDirection: 'row', alignItems: 'flex-end', gap: space.md },
  prefixInput: { width: 88, minHeight: 40 },
  quickText: { flex: 1, paddingBottom: space.sm },
  phoneTop: { paddingHorizontal: space.md, paddingTop: space.sm, gap: space.sm },
  phoneReading: { flex: 1 },
  phoneReadingContent: { padding: space.md, gap: space.md },
  phoneKeypad: { padding: space.sm, borderTopWidth: 1 },
  wideRoot: { flexDirection: 'row' },
  wideLeft: { width: 440, padding: space.xl, gap: space.lg },
  wideRight: { flex: 1, borderLeftWidth: 1 },
  wideRightContent: { padding: space.xl, gap: space.lg, maxWidth: 760 },
  readingCard: { borderWidth: 1, borderRadius: radius.lg, padding: space.xl, minHeight: 220 },
});
