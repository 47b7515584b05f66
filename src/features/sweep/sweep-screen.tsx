import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function SweepScreen() {
  return (
    <Screen title="Sweep" subtitle="List every hit in a run of sequential new notes.">
      <ComingNext what="Sequential sweep" points={['First serial and a count: strap, bundle or brick', 'A table of hits, exportable', ]} />
    </Screen>
  );
}
