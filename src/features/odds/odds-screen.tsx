import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function OddsScreen() {
  return (
    <Screen title="Odds" subtitle="Every pattern, how rare it is exactly, and what it is worth to you.">
      <ComingNext what="The rarity table" points={['Exact counts and 1-in-N for each pattern', 'Your weights, keep threshold and watch patterns', ]} />
    </Screen>
  );
}
