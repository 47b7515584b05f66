import type { HuntDetail } from '@shared/contracts';
import { AsyncBlock } from '@/components/ui/async-block';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { SectionCard } from '@/components/ui/section-card';
import { useSession } from '@/lib/session/session-provider';
import { updateStrap, useStrapSheet } from '../api';
import { PrintableSheet } from '../components/printable-sheet';
import { StrapSheetEditor } from '../components/strap-sheet-editor';
import { PrintArea, printSheet } from '../print-area';
import { sheetText } from '../sheet-text';

export function StrapSheetSection({ hunt, wide }: { hunt: HuntDetail; wide: boolean }) {
  const sheet = useStrapSheet(hunt.id);
  const { user } = useSession();
  return (
    <SectionCard
      title="Strap sheet"
      testID="strap-sheet-section"
      actions={
        sheet.data ? (
          <Button
            compact
            kind="secondary"
            label="Print strap sheet"
            accessibilityLabel="Print strap sheet for the teller"
            onPress={() => sheet.data && printSheet(sheetText(sheet.data, hunt.startedAt))}
            testID="print-sheet"
          />
        ) : null
      }
    >
      <AsyncBlock what="strap sheet" data={sheet.data} error={sheet.error} retry={() => void sheet.mutate()}>
        {(data) => (
          <>
            <StrapSheetEditor sheet={data} canEdit wide={wide} onSave={(strap, body) => updateStrap(hunt.id, strap, body)} />
            <Text variant="caption" tone="faint">
              The printed sheet shows counts of notes only, never dollar amounts or serials: keep cash totals private.
            </Text>
            <PrintArea>
              <PrintableSheet sheet={data} startedAt={hunt.startedAt} hunter={hunt.owner.displayName || user?.displayName || ''} />
            </PrintArea>
          </>
        )}
      </AsyncBlock>
    </SectionCard>
  );
}
