import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';

export type EditorNotOwnerProps = { setupId: number; ownerHandle: string };

/** Someone else's sheet: say so plainly and offer the way back to reading it. */
export function EditorNotOwner({ setupId, ownerHandle }: EditorNotOwnerProps) {
  return (
    <Card>
      <AppText variant="heading">Only its owner can edit this setup</AppText>
      <AppText>
        This sheet belongs to @{ownerHandle}. You can still read every value and its history on the setup page.
      </AppText>
      <ButtonLink href={`/setups/${setupId}`} label="Back to the setup" />
    </Card>
  );
}
