import { usePathname } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { signInHref, useMeQuery } from '../hooks/auth';
import { useCreateReport } from '../hooks/reports';
import type { CommentDto } from '../shared/types/forks';
import type { ReportTargetType } from '../shared/types/moderation';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ButtonLink } from './ButtonLink';
import { ModerationDialog } from './ModerationDialog';
import { ReportForm } from './ReportForm';

export type ReportControlProps = {
  target: { type: ReportTargetType; id: number };
  /** Handle of whoever posted it; nobody is offered a report of their own content. */
  ownerHandle: string;
  /** "this setup", "the comment by @pell-strand": used in the button's spoken name and the dialog. */
  what: string;
};

function SignInPrompt({ what, onClose }: { what: string; onClose: () => void }) {
  const here = usePathname();
  return (
    <View style={styles.stack}>
      <AppText>Sign in to report {what}. Reports come from signed-in racers so moderators can follow them up.</AppText>
      <View style={styles.row}>
        <ButtonLink href={signInHref(here || '/')} label="Sign in to report" />
        <Button label="Cancel" variant="secondary" onPress={onClose} />
      </View>
    </View>
  );
}

/**
 * A "Report" button and its dialog for anything racers post. Hidden on one's own content; signed
 * out, the dialog asks the reader to sign in first.
 */
export function ReportControl({ target, ownerHandle, what }: ReportControlProps) {
  const me = useMeQuery();
  const create = useCreateReport();
  const [open, setOpen] = useState(false);
  if (me.isPending || me.data?.handle.toLowerCase() === ownerHandle.toLowerCase()) return null;
  const close = () => {
    setOpen(false);
    create.reset();
  };
  return (
    <>
      <Button label="Report" variant="secondary" accessibilityLabel={`Report ${what}`} onPress={() => setOpen(true)} />
      <ModerationDialog visible={open} title={`Report ${what}`} onClose={close}>
        {me.data ? (
          <ReportForm target={target} what={what} onSubmit={(body) => create.mutateAsync(body)} onClose={close} />
        ) : (
          <SignInPrompt what={what} onClose={close} />
        )}
      </ModerationDialog>
    </>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
});

/** The report control for one comment, for comment threads' `report` slot. */
export function commentReport(comment: CommentDto) {
  return (
    <ReportControl target={{ type: 'comment', id: comment.id }} ownerHandle={comment.author.handle} what={`the comment by @${comment.author.handle}`} />
  );
}
