import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function KeepersScreen() {
  return (
    <Screen title="Keepers" subtitle="The notes you pulled and kept.">
      <ComingNext what="Your keeper log" points={['Search, sort and filter your finds', 'Grades, photos and estimated values', ]} />
    </Screen>
  );
}
