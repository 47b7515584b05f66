import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function HuntScreen() {
  return (
    <Screen title="Hunt" subtitle="Strap sheet, hits and tally for one hunt.">
      <ComingNext what="The hunt page" points={['Strap sheet with counts per strap', 'Hits table and tally against chance', ]} />
    </Screen>
  );
}
