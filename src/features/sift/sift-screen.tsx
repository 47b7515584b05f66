import { lazy, startTransition, Suspense, useCallback, useEffect, useMemo, useReducer, useRef, useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useFocusEffect } from 'expo-router';
import { read } from '@shared/engine';
import { districtByLetter } from '@shared/trade';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { PageHeading } from '@/components/ui/page-heading';
import { Text } from '@/components/ui/text';
import { useDeviceScanQueue } from '@/lib/storage/use-scan-queue';
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
import { StarRunField, parseStarRun } from './components/star-run-field';
import { QueueBadge, RefusedNotes } from './components/sync-badge';
import { Trail } from './components/trail';
import { markEighthKey, measureReadingPainted } from './paint-timing';
import { nearMissLines } from './reading-view';
import { emptyEntry, entryReducer, isComplete, SERIAL_LENGTH, type EntryAction, type SerialEntry } from './serial-entry';
import type { TrailNote } from './strap-count';
import { KEY_HINTS, useHardwareKeys } from './use-hardware-keys';
import { TYPED, useNoteLog, type EntrySource } from './use-note-log';
import { useSiftSession } from './use-sift-session';
import type { FrameVerdict } from '@shared/ocr/acceptance';
import { useCameraSettings } from '../camera/camera-settings';
import { announceFind } from '../camera/find-feedback';
import { loggedKey, useLoggedSerials } from '../camera/use-logged-serials';

// The camera, its recogniser and the model load only when the hunter first opens the camera.
const CameraPanel = lazy(() => import('../camera/camera-panel').then((module) => ({ default: module.CameraPanel })));


export function SiftScreen() {
  const theme = useTheme();
  const { isWide } = useLayout();
  const weights = useActiveWeights();
  const watch = useWatchForReading();
  const queue = useDeviceScanQueue();
  const [choosing, setChoosing] = useState(false);
  const [entry, dispatchEntry] = useReducer(entryReducer, emptyEntry);
  // Handlers read the entry from here, not from the last render: keys can arrive faster than React paints.
  const entryRef = useRef<SerialEntry>(emptyEntry);
  const dispatch = useCallback((action: EntryAction) => {
    entryRef.current = entryReducer(entryRef.current, action);
    dispatchEntry(action);
  }, []);
  const [flash, setFlash] = useState<{ tone: 'ok' | 'error' | 'info'; text: string } | null>(null);
  const [starRunText, setStarRunTextState] = useState('');
  const starRunRef = useRef('');
  const setStarRunText = useCallback((text: string) => {
    starRunRef.current = text;
    setStarRunTextState(text);
  }, []);
  const starRunSize = entry.star ? parseStarRun(starRunText) : null;
  const [mode, setMode] = useState<'keypad' | 'camera'>('keypad');
  const [source, setSourceState] = useState<EntrySource>(TYPED);
  const sourceRef = useRef<EntrySource>(TYPED);
  const setSource = useCallback((next: EntrySource) => {
    sourceRef.current = next;
    setSourceState(next);
  }, []);
  const [cameraStatus, setCameraStatus] = useState<string | null>(null);
  const camera = useCameraSettings();

  const [sheetHuntId, setSheetHuntId] = useState<string | null>(null);
  const sheetQuery = useStrapSheet(sheetHuntId);
  const sheetStart = sheetQuery.data ?? (sheetQuery.error && sheetHuntId ? { huntId: sheetHuntId, straps: [] } : undefined);
  const session = useSiftSession(sheetStart);
  const logged = useLoggedSerials(session.huntId);
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
        ? read(`${entry.prefix}${entry.digits}`, {
            weights,
            watch,
            star: entry.star,
            denomination: session.hunt?.denomination,
            series: session.hunt?.series ?? undefined,
            starRunSize,
          })
        : null,
    [entry, weights, watch, session.hunt?.denomination, session.hunt?.series, starRunSize],
  );
  useEffect(() => {
    if (reading) measureReadingPainted();
  }, [reading]);

  const typeDigit = useCallback(
    (digit: string) => {
      const from = sourceRef.current;
      if (from.method === 'camera' && from.logged) {
        // The camera already logged what the cells show: a typed digit starts the next note.
        dispatch({ type: 'clear' });
        setSource(TYPED);
      }
      if (entryRef.current.digits.length === SERIAL_LENGTH - 1) markEighthKey();
      dispatch({ type: 'digit', digit });
    },
    [dispatch, setSource],
  );

  const { enqueue } = useNoteLog({ queue, session, logged, weights, watch });

  /** The one path for every note, typed or read: the device queue first, then the strap count. */
  const logEntry = useCallback(
    async (note: SerialEntry, from: EntrySource, runSize: number | null = null) => {
      try {
        const stored = await enqueue(note, from, runSize);
        if (!stored) return null;
        const done = stored.completedStrap;
        if (done) setFlash({ tone: 'ok', text: `Strap ${done} done: 100 notes searched. Band it; strap ${done + 1} is next.` });
        if (from.method === 'camera' && stored.reading.patterns.length > 0) announceFind(camera.settings);
        return stored.reading;
      } catch {
        // The note never reached the device store: give it back to the cells rather than lose it.
        setFlash({ tone: 'error', text: `Could not save ${note.prefix}${note.digits} on this device. It is back in the cells; log it again.` });
        if (!entryRef.current.digits) dispatch({ type: 'restore', entry: note });
        return null;
      }
    },
    [enqueue, camera.settings, dispatch],
  );

  /** Enter or Log: the cells clear at once and the note joins the line, so the next key starts the next note. */
  const logNote = useCallback(() => {
    const note = entryRef.current;
    const from = sourceRef.current;
    if (!isComplete(note) || (from.method === 'camera' && from.logged)) return;
    const runSize = note.star ? parseStarRun(starRunRef.current) : null;
    const check = read(`${note.prefix}${note.digits}`, {
      weights,
      watch,
      star: note.star,
      denomination: session.hunt?.denomination,
      series: session.hunt?.series ?? undefined,
      starRunSize: runSize,
    });
    // A serial the engine refuses stays in the cells, where the reading says why.
    if (!check.ok) return;
    setFlash(null);
    setStarRunText('');
    dispatch({ type: 'clear' });
    setSource(TYPED);
    void logEntry(note, from, runSize);
  }, [weights, watch, session.hunt?.denomination, session.hunt?.series, dispatch, setSource, setStarRunText, logEntry]);

  // Verdicts arrive one per frame; a ref keeps the handler current without restarting the camera.
  const onVerdict = useRef<(verdict: FrameVerdict) => void>(() => undefined);
  onVerdict.current = (verdict: FrameVerdict) => {
    if (verdict.kind !== 'accept') return;
    const { read: seen, unsure } = verdict;
    const note = { digits: seen.digits, prefix: seen.prefix, star: seen.star, pulled: false };
    const from: EntrySource = { method: 'camera', confidence: seen.confidence, suffix: seen.suffix, unsure, logged: false };
    // The camera's updates render as a transition, in slices between frames, so the page never holds a
    // long task while the camera runs (the keypad's own keys stay urgent).
    if (logged.has(loggedKey(note))) {
      startTransition(() => setCameraStatus(`${seen.serial} is already logged in this hunt; not logged again.`));
      return;
    }
    const ask = !camera.settings.autoLog || unsure.length > 0;
    startTransition(() => {
      setCameraStatus(ask ? (unsure.length ? `Check the marked digits, fix them on the keypad if needed, then log.` : `Tap Log to keep ${seen.serial}.`) : null);
      dispatch({ type: 'restore', entry: note });
      setSource(ask ? from : { ...from, logged: true });
      if (!ask) setFlash(null);
    });
    if (!ask) void logEntry(note, from);
  };
  const handleVerdict = useCallback((verdict: FrameVerdict) => onVerdict.current(verdict), []);

  const undoLast = useCallback(async () => {
    if (!queue) return;
    const removed = await session.undo();
    if (removed) {
      await queue.undo(removed.id);
      await logged.remove(loggedKey(removed));
      setFlash({ tone: 'info', text: `Took back ${removed.digits} from strap ${removed.strap}.` });
    }
  }, [queue, session, logged]);

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
      onLog: logNote,
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
              void session.selectHunt({ id: hunt.id, title: hunt.title, denomination: hunt.denomination, series: hunt.series });
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

  const modeSwitch = (
    <Button
      compact
      kind={mode === 'camera' ? 'primary' : 'secondary'}
      label={mode === 'camera' ? 'Keypad' : 'Camera'}
      accessibilityLabel={mode === 'camera' ? 'Switch to the keypad' : 'Read serials with the camera'}
      onPress={() => setMode(mode === 'camera' ? 'keypad' : 'camera')}
      testID="mode-switch"
    />
  );

  const cameraLogged = source.method === 'camera' && source.logged;
  const header = (
    <View style={styles.header}>
      <PageHeading hidden>{`Sift: ${session.hunt.title}`}</PageHeading>
      <View style={styles.headerTop}>
        <Button compact kind="quiet" label={`${session.hunt.title} ▾`} accessibilityLabel={`Hunt: ${session.hunt.title}. Switch hunt`} onPress={() => setChoosing(true)} testID="switch-hunt" truncate style={styles.huntTitle} />
        <QueueBadge queue={queue} />
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
        <View style={styles.headerActions}>
          {modeSwitch}
          <Button compact kind="secondary" label="Undo" accessibilityLabel="Undo the last note" onPress={() => void undoLast()} disabled={!count?.trail.length} testID="undo" />
        </View>
      </View>
    </View>
  );

  const entryArea = (
    <View style={styles.entry}>
      <DigitCells
        digits={entry.digits}
        prefix={entry.prefix}
        star={entry.star}
        highlight={misses[0]?.distance === 1 ? misses[0].positions : []}
        unsure={source.method === 'camera' && !source.logged ? source.unsure : []}
        hit={!!reading?.ok && reading.patterns.length > 0}
      />
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
      {entry.star ? <StarRunField value={starRunText} onChange={setStarRunText} /> : null}
    </View>
  );

  const cameraArea = (
    <View style={styles.cameraArea}>
      <Suspense fallback={<Text tone="muted">Opening the camera…</Text>}>
        <CameraPanel onVerdict={handleVerdict} onClose={() => setMode('keypad')} status={cameraStatus} />
      </Suspense>
      <View style={styles.cameraActions}>
        <Button
          label={cameraLogged ? 'Logged' : 'Log'}
          accessibilityLabel={cameraLogged ? 'This note is logged' : 'Log this note'}
          onPress={logNote}
          disabled={!reading?.ok || cameraLogged}
          style={styles.cameraLog}
          testID="camera-log"
        />
        <Button kind="secondary" label="Undo" accessibilityLabel="Undo the last note" onPress={() => void undoLast()} disabled={!count?.trail.length} testID="camera-undo" />
      </View>
    </View>
  );

  const keypad = mode === 'camera' ? cameraArea : (
    <Keypad
      onDigit={typeDigit}
      onDelete={() => dispatch({ type: 'delete' })}
      onLog={logNote}
      onToggleStar={() => dispatch({ type: 'toggle-star' })}
      onTogglePulled={() => dispatch({ type: 'toggle-pulled' })}
      star={entry.star}
      pulled={entry.pulled}
      canLog={!!reading?.ok && !cameraLogged}
      canDelete={entry.digits.length > 0}
      showShortcuts={isWide}
    />
  );

  const notice = flash ? <Notice tone={flash.tone === 'error' ? 'error' : flash.tone === 'ok' ? 'ok' : 'info'}>{flash.text}</Notice> : null;
  const rejected = <RefusedNotes queue={queue} />;

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
  headerActions: { flexDirection: 'row', gap: space.sm },
  // A long hunt title gives way (with an ellipsis) so the sync badge beside it stays whole on a phone.
  huntTitle: { flexShrink: 1, minWidth: 0 },
  cameraArea: { gap: space.sm },
  cameraActions: { flexDirection: 'row', gap: space.sm },
  cameraLog: { flex: 1 },
  readingCard: { borderWidth: 1, borderRadius: radius.lg, padding: space.xl, minHeight: 220 },
});
