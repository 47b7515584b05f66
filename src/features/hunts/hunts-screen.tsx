import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function HuntsScreen() {
  return (
    <Screen title="Hunts" subtitle="Every session you sifted, strap by strap.">
      <ComingNext what="Your hunts" points={['Notes searched, hits and best find per hunt', 'Strap sheets to hand the teller', ]} />
    </Screen>
  );
}
