import { StyleSheet, View } from 'react-native';
import type { HuntDetail } from '@shared/contracts';
import { AsyncBlock } from '@/components/ui/async-block';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { SectionCard } from '@/components/ui/section-card';
import { formatCount } from '@/lib/format';
import { space } from '@/theme/tokens';
import { useHuntScans } from '../api';
import { HitsTable } from '../components/hits-table';

/** Pages of 200 notes read before the finds table asks: 1,000 notes, ten straps. */
const PAGES_AT_ONCE = 5;

/** The notes with a pattern, read page by page from the newest. */
export function FindsSection({ hunt, wide, crew }: { hunt: HuntDetail; wide: boolean; crew: boolean }) {
  const scans = useHuntScans(hunt.id);
  const pages = scans.data ?? [];
  const read = pages.reduce((sum, page) => sum + page.items.length, 0);
  const finds = pages.flatMap((page) => page.items.filter((scan) => scan.patterns.length > 0));
  const more = !!pages[pages.length - 1]?.nextCursor;
  const busy = scans.isValidating && pages.length < scans.size;
  return (
    <SectionCard title={`Finds${scans.data ? ` · ${finds.length}${more ? '+' : ''}` : ''}`} testID="hits-section">
      <AsyncBlock what="finds" data={scans.data} error={scans.error} retry={() => void scans.mutate()}>
        {() =>
          finds.length === 0 && !more ? (
            <Text tone="muted">No finds among the {formatCount(read)} notes logged{read ? '' : ' yet'}.</Text>
          ) : (
            <HitsTable hits={finds} wide={wide} showLoggedBy={crew} />
          )
        }
      </AsyncBlock>
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
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  more: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
});
