import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function KeeperScreen() {
  return (
    <Screen title="Keeper" subtitle="One pulled note in full.">
      <ComingNext what="The keeper page" points={['Details, grade and photos', 'A share link for a fellow collector', ]} />
    </Screen>
  );
}
