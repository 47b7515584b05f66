import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { DENOMINATIONS } from '@shared/contracts';
import { sweep, type ParsedSerial, type SweepResult } from '@shared/engine';
import { NOTES_PER_STRAP, runEndFor } from '@shared/trade';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceRow } from '@/components/ui/choice-row';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useSubmit } from '@/lib/api/use-submit';
import { useLayout } from '@/theme/use-layout';
import { space } from '@/theme/tokens';
import { createHunt } from '../hunts/api';
import { useActiveWeights } from '../odds/api';
import { useSiftSession } from '../sift/use-sift-session';
import { SweepForm } from './components/sweep-form';
import { SweepResults } from './components/sweep-results';
import { saveCsv } from './save-csv';
import { sweepCsv, sweepFileName } from './sweep-csv';
import { fullSerial, type SweepRequest } from './sweep-input';

/** A hunt plans at most 400 straps (the contract's limit), so longer runs are swept but not hunted. */
const MAX_HUNT_STRAPS = 400;

interface Swept {
  result: SweepResult;
  serial: ParsedSerial;
  ms: number;
  /** Changes with every run, so the results table starts again at its first page. */
  run: number;
}

export function SweepScreen() {
  const { isWide } = useLayout();
  const weights = useActiveWeights();
  const sift = useSiftSession(undefined);
  const [busy, setBusy] = useState(false);
  const [swept, setSwept] = useState<Swept | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const [denomination, setDenomination] = useState<number>(1);
  const [source, setSource] = useState('New notes in sequence');
  const [exportNote, setExportNote] = useState<string | null>(null);

  const [lastRequest, setLastRequest] = useState<SweepRequest | null>(null);

  // Circulating notes of a face value stop at its run end (TRADE.md), so the sweep does too.
  const runSweep = (request: SweepRequest, face = denomination) => {
    setLastRequest(request);
    setBusy(true);
    setFailure(null);
    setExportNote(null);
    // Yield a frame so the busy state paints before a long sweep holds the thread.
    setTimeout(() => {
      try {
        const started = Date.now();
        const last = Math.max(request.serial.value, runEndFor(face)?.last ?? 99_999_999);
        const result = sweep(request.serial.value, request.count, request.patterns, { lowLimit: weights.lowLimit, last });
        setSwept((previous) => ({ result, serial: request.serial, ms: Date.now() - started, run: (previous?.run ?? 0) + 1 }));
      } catch (error) {
        setFailure(error instanceof Error ? error.message : 'The sweep could not run.');
      } finally {
        setBusy(false);
      }
    }, 16);
  };

  const exportCsv = async () => {
    if (!swept) return;
    try {
      await saveCsv(sweepFileName(swept.result), sweepCsv(swept.result, swept.serial));
      setExportNote(`Saved ${sweepFileName(swept.result)}.`);
    } catch {
      setExportNote('The file could not be saved.');
    }
  };

  const straps = swept ? Math.ceil(swept.result.count / NOTES_PER_STRAP) : 0;
  const starting = useSubmit(async () => {
    if (!swept) return;
    const first = fullSerial(String(swept.result.first).padStart(8, '0'), swept.serial);
    const hunt = await createHunt({
      title: `Run from ${first}`,
      source: source.trim(),
      denomination,
      plannedStraps: straps,
      // A swept run is new notes in sequence: Tally compares it run for run, not as independent draws.
      inSequence: true,
    });
    await sift.selectHunt({ id: hunt.id, title: hunt.title, denomination: hunt.denomination, series: hunt.series });
    router.push('/sift');
  });

  return (
    <Screen
      title="Sweep"
      subtitle="Every find in a run of sequential new notes: a strap, a bundle, a brick or more."
      actions={<Button kind="quiet" label="‹ Hunts" accessibilityLabel="Back to hunts" onPress={() => router.push('/hunts')} testID="sweep-to-hunts" />}
    >
      <Card>
        <SweepForm onSweep={runSweep} busy={busy} />
      </Card>
      <Text variant="caption" tone="faint">
        The sweep runs on this device with the same engine as Sift: nothing is sent anywhere. Low serials count up to{' '}
        {weights.lowLimit.toLocaleString('en-US')}, your low limit.
      </Text>
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      {swept ? (
        <>
          <View style={styles.actions}>
            <Button
              kind="secondary"
              label="Export CSV"
              accessibilityLabel="Export the finds as a CSV file"
              onPress={() => void exportCsv()}
              disabled={swept.result.hits.length === 0}
              testID="sweep-export"
            />
            <Text variant="caption" tone="faint">
              Swept in {swept.ms.toLocaleString('en-US')} ms.
            </Text>
            {exportNote ? (
              <Text variant="caption" tone="ok" testID="sweep-export-note">
                {exportNote}
              </Text>
            ) : null}
          </View>
          <SweepResults key={swept.run} result={swept.result} serial={swept.serial} wide={isWide} />
          <Card testID="sweep-start-hunt">
            <Text variant="heading" accessibilityRole="header" aria-level={2}>
              Hunt these notes
            </Text>
            {straps <= MAX_HUNT_STRAPS ? (
              <>
                <Text tone="muted">
                  Starts a hunt of {straps} {straps === 1 ? 'strap' : 'straps'} and opens Sift on it, so each note you pull is counted on
                  the strap sheet.
                </Text>
                {starting.message ? <Notice tone="error">{starting.message}</Notice> : null}
                <View style={styles.huntFields}>
                  <View style={styles.grow}>
                    <Field label="Where the notes came from (optional)" value={source} onChangeText={setSource} error={starting.fields.source} testID="sweep-hunt-source" />
                  </View>
                  <ChoiceRow
                    label="Face value"
                    options={DENOMINATIONS.map((value) => ({ value, label: `$${value}` }))}
                    value={denomination}
                    onChange={(value) => {
                      setDenomination(Number(value));
                      if (lastRequest) runSweep(lastRequest, Number(value));
                    }}
                  />
                </View>
                <Button
                  label={straps === 1 ? 'Start a hunt from this strap' : `Start a hunt from these ${straps} straps`}
                  busy={starting.busy}
                  onPress={() => void starting.submit()}
                  style={styles.alignStart}
                  testID="sweep-start"
                />
              </>
            ) : (
              <Text tone="muted">
                A hunt holds at most {MAX_HUNT_STRAPS} straps ({(MAX_HUNT_STRAPS * NOTES_PER_STRAP).toLocaleString('en-US')} notes); sweep a shorter run to
                hunt it.
              </Text>
            )}
          </Card>
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  huntFields: { gap: space.md },
  grow: { flexGrow: 1 },
  alignStart: { alignSelf: 'flex-start' },
});
