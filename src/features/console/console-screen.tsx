import { ComingNext } from '@/components/ui/coming-next';
import { Screen } from '@/components/ui/screen';

export function ConsoleScreen() {
  return (
    <Screen title="Console" subtitle="Accounts and system totals for admins.">
      <ComingNext what="Admin console" points={['Users with search, disable and enable', 'System totals', ]} />
    </Screen>
  );
}
