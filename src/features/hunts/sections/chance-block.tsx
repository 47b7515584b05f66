import { router } from 'expo-router';
import type { HuntDetail } from '@shared/contracts';
import { AsyncBlock } from '@/components/ui/async-block';
import { Button } from '@/components/ui/button';
import { SectionCard } from '@/components/ui/section-card';
import { ChanceSection } from '../../tally/components/chance-section';
import { useHuntTally } from '../api';

/** The hunt's finds per pattern against what chance predicts for as many notes. */
export function ChanceBlock({ hunt, wide }: { hunt: HuntDetail; wide: boolean }) {
  const tally = useHuntTally(hunt.id);
  return (
    <SectionCard
      title="Against chance"
      testID="hunt-tally"
      actions={<Button compact kind="quiet" label="Open Tally" accessibilityLabel="Open Tally for every hunt" onPress={() => router.push('/tally')} />}
    >
      <AsyncBlock what="tally" data={tally.data} error={tally.error} retry={() => void tally.mutate()}>
        {(figures) => <ChanceSection figures={figures} wide={wide} testID="hunt-chance" />}
      </AsyncBlock>
    </SectionCard>
  );
}
