import type { HuntDetail } from '@shared/contracts';
import { AsyncBlock } from '@/components/ui/async-block';
import { SectionCard } from '@/components/ui/section-card';
import { useSession } from '@/lib/session/session-provider';
import { addMember, removeMember, useHuntMembers } from '../api';
import { CrewList } from '../components/crew-list';
import { InviteCrew } from '../components/invite-crew';

export function CrewBlock({ hunt, onLeft }: { hunt: HuntDetail; onLeft(): void }) {
  const members = useHuntMembers(hunt.id);
  const { user } = useSession();
  return (
    <SectionCard title={`Crew · ${hunt.memberCount}`} testID="crew-section">
      <AsyncBlock what="crew" data={members.data} error={members.error} retry={() => void members.mutate()}>
        {(data) => (
          <CrewList
            members={data.items}
            isOwner={hunt.role === 'owner'}
            currentUserId={user?.id ?? null}
            onAdd={(email) => addMember(hunt.id, { email })}
            onRemove={(userId) => removeMember(hunt.id, userId)}
            onLeft={onLeft}
          />
        )}
      </AsyncBlock>
      {hunt.role === 'owner' && hunt.status === 'open' ? <InviteCrew huntId={hunt.id} /> : null}
    </SectionCard>
  );
}
