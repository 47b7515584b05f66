import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function TallyScreen() {
  return (
    <Screen title="Tally" subtitle="Hit rates against what chance predicts.">
      <ComingNext what="Your statistics" points={['Hits per 1,000 notes per pattern', 'Actual against expected, over hunts and time', ]} />
    </Screen>
  );
}
