import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function SiftScreen() {
  return (
    <Screen title="Sift" subtitle="Type each serial; the reading lands with the eighth digit.">
      <ComingNext what="The keypad" points={['Eight digit cells and a thumb-sized keypad', 'Patterns, near misses and neighbours as you type', 'Strap progress and an offline queue that never loses a note', ]} />
    </Screen>
  );
}
