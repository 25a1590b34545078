import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';
import { HtmlContent } from './HtmlContent';

export type SetupNotesProps = {
  /** Rendered and cleaned by the server from the setup's markdown. */
  notesHtml: string;
  /** Where the owner writes notes; absent for other readers. */
  editHref?: string;
};

/** The racer's own words about the setup: what it is for and what to watch. */
export function SetupNotes({ notesHtml, editHref }: SetupNotesProps) {
  const empty = notesHtml.trim() === '';
  return (
    <Card>
      <AppText variant="heading">Notes</AppText>
      {empty ? <AppText tone="muted">No notes yet.</AppText> : <HtmlContent html={notesHtml} />}
      {editHref ? <ButtonLink href={editHref} label={empty ? 'Write notes' : 'Edit notes'} variant="secondary" /> : null}
    </Card>
  );
}
