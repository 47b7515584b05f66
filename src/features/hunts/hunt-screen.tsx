import { router, useLocalSearchParams } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import type { HuntDetail } from '@shared/contracts';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Stat, StatRow } from '@/components/ui/stat';
import { Text } from '@/components/ui/text';
import { ApiError } from '@/lib/api/api-error';
import { useSubmit } from '@/lib/api/use-submit';
import { useSession } from '@/lib/session/session-provider';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';
import { radius, space } from '@/theme/tokens';
import { useSiftSession } from '../sift/use-sift-session';
import { ChanceSection } from '../tally/components/chance-section';
import { caption, formatCount, formatDate, formatRate } from '@/lib/format';
import {
  addMember,
  closeHunt,
  mailSummary,
  deleteHunt,
  removeMember,
  updateStrap,
  useHunt,
  useHuntMembers,
  useHuntScans,
  useHuntTally,
  useStrapSheet,
} from './api';
import { CrewList } from './components/crew-list';
import { HitsTable } from './components/hits-table';
import { InviteCrew } from './components/invite-crew';
import { PrintableSheet } from './components/printable-sheet';
import { StrapSheetEditor } from './components/strap-sheet-editor';
import { PrintArea, printSheet } from './print-area';
import { sheetText } from './sheet-text';

/** Pages of 200 notes read before the hits table asks: 1,000 notes, ten straps. */
const PAGES_AT_ONCE = 5;

function Section({ title, children, actions, testID }: { title: string; children: ReactNode; actions?: ReactNode; testID?: string }) {
  const theme = useTheme();
  return (
    <View style={[styles.section, { borderColor: theme.line, backgroundColor: theme.surfaceRaised }]} testID={testID}>
      <View style={styles.sectionHead}>
        <Text variant="heading" accessibilityRole="header" aria-level={2}>
          {title}
        </Text>
        {actions ? <View style={styles.sectionActions}>{actions}</View> : null}
      </View>
      {children}
    </View>
  );
}

function Loading({ what }: { what: string }) {
  const theme = useTheme();
  return (
    <View style={styles.loading} accessibilityLabel={`Loading ${what}`}>
      <ActivityIndicator color={theme.brand} />
      <Text tone="muted">Loading {what}…</Text>
    </View>
  );
}

function LoadError({ what, error, retry }: { what: string; error: unknown; retry(): void }) {
  return (
    <View style={styles.gap}>
      <Notice tone="error" title={`The ${what} could not be loaded`}>
        {error instanceof Error ? error.message : 'Something went wrong.'}
      </Notice>
      <Button kind="secondary" compact label="Try again" onPress={retry} style={styles.alignStart} />
    </View>
  );
}

function StrapSheetSection({ hunt, wide }: { hunt: HuntDetail; wide: boolean }) {
  const sheet = useStrapSheet(hunt.id);
  const { user } = useSession();
  return (
    <Section
      title="Strap sheet"
      testID="strap-sheet-section"
      actions={
        sheet.data ? (
          <Button
            compact
            kind="secondary"
            label="Print strap sheet"
            accessibilityLabel="Print strap sheet for the teller"
            onPress={() => sheet.data && printSheet(sheetText(sheet.data, hunt.startedAt))}
            testID="print-sheet"
          />
        ) : null
      }
    >
      {sheet.data ? (
        <>
          <StrapSheetEditor
            sheet={sheet.data}
            canEdit
            wide={wide}
            onSave={(strap, body) => updateStrap(hunt.id, strap, body)}
          />
          <Text variant="caption" tone="faint">
            The printed sheet shows counts of notes only, never dollar amounts or serials: keep cash totals private.
          </Text>
          <PrintArea>
            <PrintableSheet sheet={sheet.data} startedAt={hunt.startedAt} hunter={hunt.owner.displayName || user?.displayName || ''} />
          </PrintArea>
        </>
      ) : sheet.error ? (
        <LoadError what="strap sheet" error={sheet.error} retry={() => void sheet.mutate()} />
      ) : (
        <Loading what="the strap sheet" />
      )}
    </Section>
  );
}

function HitsSection({ hunt, wide, crew }: { hunt: HuntDetail; wide: boolean; crew: boolean }) {
  const scans = useHuntScans(hunt.id);
  const pages = scans.data ?? [];
  const read = pages.reduce((sum, page) => sum + page.items.length, 0);
  const hits = pages.flatMap((page) => page.items.filter((scan) => scan.patterns.length > 0));
  const more = !!pages[pages.length - 1]?.nextCursor;
  const busy = scans.isValidating && pages.length < scans.size;
  return (
    <Section title={`Finds${scans.data ? ` · ${hits.length}${more ? '+' : ''}` : ''}`} testID="hits-section">
      {scans.error && !scans.data ? (
        <LoadError what="finds" error={scans.error} retry={() => void scans.mutate()} />
      ) : !scans.data ? (
        <Loading what="finds" />
      ) : hits.length === 0 && !more ? (
        <Text tone="muted">No finds among the {formatCount(read)} notes logged{read ? '' : ' yet'}.</Text>
      ) : (
        <HitsTable hits={hits} wide={wide} showLoggedBy={crew} />
      )}
      {more ? (
        <View style={styles.more}>
          <Text variant="caption" tone="muted">
            Read the newest {formatCount(read)} of {formatCount(hunt.notesSearched)} notes.
          </Text>
          <Button
            compact
            kind="secondary"
            label="Look through older notes"
            busy={busy}
            onPress={() => void scans.setSize(scans.size + PAGES_AT_ONCE)}
            testID="hits-more"
          />
        </View>
      ) : null}
    </Section>
  );
}

function ChanceBlock({ hunt, wide }: { hunt: HuntDetail; wide: boolean }) {
  const tally = useHuntTally(hunt.id);
  return (
    <Section
      title="Against chance"
      testID="hunt-tally"
      actions={<Button compact kind="quiet" label="Open Tally" accessibilityLabel="Open Tally for every hunt" onPress={() => router.push('/tally')} />}
    >
      {tally.data ? (
        <ChanceSection figures={tally.data} wide={wide} testID="hunt-chance" />
      ) : tally.error ? (
        <LoadError what="tally" error={tally.error} retry={() => void tally.mutate()} />
      ) : (
        <Loading what="the tally" />
      )}
    </Section>
  );
}

function CrewBlock({ hunt, onLeft }: { hunt: HuntDetail; onLeft(): void }) {
  const members = useHuntMembers(hunt.id);
  const { user } = useSession();
  return (
    <Section title={`Crew · ${hunt.memberCount}`} testID="crew-section">
      {members.data ? (
        <CrewList
          members={members.data.items}
          isOwner={hunt.role === 'owner'}
          currentUserId={user?.id ?? null}
          onAdd={(email) => addMember(hunt.id, { email })}
          onRemove={(userId) => removeMember(hunt.id, userId)}
          onLeft={onLeft}
        />
      ) : members.error ? (
        <LoadError what="crew" error={members.error} retry={() => void members.mutate()} />
      ) : (
        <Loading what="the crew" />
      )}
      {hunt.role === 'owner' && hunt.status === 'open' ? <InviteCrew huntId={hunt.id} /> : null}
    </Section>
  );
}

function ManageBlock({ hunt }: { hunt: HuntDetail }) {
  const [asking, setAsking] = useState<'close' | 'delete' | null>(null);
  const closing = useSubmit(async () => {
    await closeHunt(hunt.id);
    setAsking(null);
  });
  const deleting = useSubmit(async () => {
    await deleteHunt(hunt.id);
    setAsking(null);
    router.replace('/hunts');
  });
  const [mailedTo, setMailedTo] = useState<string | null>(null);
  const mailing = useSubmit(async () => {
    setMailedTo((await mailSummary(hunt.id)).to);
  });
  if (hunt.role !== 'owner') {
    return (
      <Section title="This hunt" testID="manage-section">
        <Text tone="muted">
          You are crew in {hunt.owner.displayName}&apos;s hunt: you log notes and square your straps; closing and deleting are theirs.
        </Text>
      </Section>
    );
  }
  const current = asking === 'close' ? closing : deleting;
  return (
    <Section title="This hunt" testID="manage-section">
      <Text tone="muted">
        {hunt.status === 'open'
          ? 'Close the hunt when the straps have gone back: no more notes can be logged into it, and its figures stay.'
          : `Closed ${hunt.closedAt ? formatDate(hunt.closedAt) : ''}. Its figures stay in your tally.`}
      </Text>
      {mailing.message ? <Notice tone="error">{mailing.message}</Notice> : null}
      {mailedTo ? <Notice tone="ok">{`The summary is on its way to ${mailedTo}.`}</Notice> : null}
      <View style={styles.manageActions}>
        {hunt.status === 'open' ? (
          <Button kind="secondary" label="Close hunt" onPress={() => setAsking('close')} testID="close-hunt" />
        ) : (
          <Button kind="secondary" label="E-mail me the summary" busy={mailing.busy} onPress={() => void mailing.submit()} testID="mail-summary" />
        )}
        <Button kind="danger" label="Delete hunt" onPress={() => setAsking('delete')} testID="delete-hunt" />
      </View>
      <ConfirmDialog
        visible={asking !== null}
        title={asking === 'close' ? `Close ${hunt.title}?` : `Delete ${hunt.title}?`}
        message={
          asking === 'close'
            ? 'Nobody can log notes into it after this, crew included. The strap sheet, finds and tally stay, and you can e-mail yourself its summary.'
            : `This removes the hunt, its strap sheet and all ${formatCount(hunt.notesSearched)} notes logged in it, for the whole crew. It cannot be undone.`
        }
        confirmLabel={asking === 'close' ? 'Close hunt' : 'Delete for good'}
        danger={asking === 'delete'}
        busy={current.busy}
        error={current.message}
        onConfirm={() => void current.submit()}
        onCancel={() => {
          closing.setMessage(null);
          deleting.setMessage(null);
          setAsking(null);
        }}
        testID="hunt-confirm"
      />
    </Section>
  );
}

const back = () => (router.canGoBack() ? router.back() : router.replace('/hunts'));

export function HuntScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const huntId = typeof id === 'string' && id ? id : null;
  const { isWide } = useLayout();
  const hunt = useHunt(huntId);
  const sift = useSiftSession(undefined);

  if (!hunt.data) {
    const missing = hunt.error instanceof ApiError && (hunt.error.status === 404 || hunt.error.status === 400);
    return (
      <Screen title="Hunt" actions={<Button kind="quiet" label="‹ Hunts" accessibilityLabel="Back to hunts" onPress={back} />}>
        {hunt.error ? (
          missing ? (
            <Notice tone="caution" title="No such hunt">
              It may have been deleted, or you are no longer in its crew.
            </Notice>
          ) : (
            <LoadError what="hunt" error={hunt.error} retry={() => void hunt.mutate()} />
          )
        ) : (
          <Loading what="the hunt" />
        )}
      </Screen>
    );
  }

  const data = hunt.data;
  const crew = data.memberCount > 1;
  const siftThis = async () => {
    await sift.selectHunt({ id: data.id, title: data.title, denomination: data.denomination });
    router.push('/sift');
  };

  const sheet = <StrapSheetSection hunt={data} wide={isWide} />;
  const hits = <HitsSection hunt={data} wide={isWide} crew={crew} />;
  const side = (
    <>
      <CrewBlock hunt={data} onLeft={() => router.replace('/hunts')} />
      <ManageBlock hunt={data} />
    </>
  );

  return (
    <Screen
      title={data.title}
      subtitle={caption(data.source, `$${data.denomination} notes`, formatDate(data.startedAt))}
      maxWidth={1320}
      actions={
        <>
          <Button kind="quiet" label="‹ Hunts" accessibilityLabel="Back to hunts" onPress={back} testID="back-to-hunts" />
          {data.status === 'open' ? <Button label="Sift this hunt" onPress={() => void siftThis()} testID="sift-this-hunt" /> : null}
          <Button kind="secondary" label="Tally" accessibilityLabel="Open the Tally" onPress={() => router.push('/tally')} />
        </>
      }
    >
      <View style={styles.badges}>
        <Badge label={data.status} tone={data.status === 'open' ? 'ok' : 'neutral'} accessibilityLabel={`Status: ${data.status}`} />
        <Badge label={data.role === 'owner' ? 'your hunt' : `crew of ${data.owner.displayName}`} tone="neutral" />
      </View>
      <StatRow>
        <Stat label="Notes searched" value={formatCount(data.notesSearched)} testID="stat-notes" />
        <Stat label="Hits" value={formatCount(data.hits)} tone={data.hits ? 'hit' : 'ink'} hint={data.notesSearched ? `${formatRate((data.hits * 1000) / data.notesSearched)} per 1,000` : undefined} />
        <Stat label="Pulled" value={formatCount(data.pulled)} />
        <Stat label="Straps" value={`${data.strapCount} of ${data.plannedStraps}`} hint="with notes logged" />
      </StatRow>
      {isWide ? (
        <View style={styles.columns}>
          <View style={styles.main}>
            {sheet}
            {hits}
          </View>
          <View style={styles.side}>{side}</View>
        </View>
      ) : (
        <>
          {sheet}
          {hits}
          {side}
        </>
      )}
      <ChanceBlock hunt={data} wide={isWide} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  section: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  sectionHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  sectionActions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  loading: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.md },
  gap: { gap: space.sm },
  alignStart: { alignSelf: 'flex-start' },
  more: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  badges: { flexDirection: 'row', gap: space.xs, flexWrap: 'wrap', marginTop: -space.sm },
  columns: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' },
  main: { flex: 1, minWidth: 0, gap: space.lg },
  side: { width: 340, gap: space.lg },
  manageActions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
