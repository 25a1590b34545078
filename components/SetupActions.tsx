import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';
import { FormErrorBanner } from './FormErrorBanner';
import { SetupConfirmButton } from './SetupConfirmButton';
import { SetupExportLink } from './SetupExportLink';

export type SetupActionsProps = {
  setupId: number;
  title: string;
  isOwner: boolean;
  /** The share code this page was opened with, carried on so exports and print work for unlisted setups. */
  share?: string;
  onDelete: () => void;
  deleting: boolean;
  deleteError: string | null;
  /** A control to report the setup to moderators (readers other than the owner). */
  report?: ReactNode;
};

/** Everything a reader can do with the setup: edit (owner), print, export, report (others), delete (owner). */
export function SetupActions({ setupId, title, isOwner, share, onDelete, deleting, deleteError, report }: SetupActionsProps) {
  const query = share ? `?share=${encodeURIComponent(share)}` : '';
  return (
    <Card role="region" aria-label="Setup actions">
      <View style={styles.row}>
        {isOwner ? <ButtonLink href={`/setups/${setupId}/edit`} label="Edit the sheet" /> : null}
        {isOwner ? <ButtonLink href={`/setups/${setupId}/details`} label="Edit details" variant="secondary" /> : null}
        <ButtonLink href={`/setups/${setupId}/print${query}`} label="Pit sheet to print" variant="secondary" />
        <SetupExportLink path={`/setups/${setupId}/export.json${query}`} label="Export setup file (JSON)" />
        <SetupExportLink path={`/setups/${setupId}/export.csv${query}`} label="Export as CSV" />
        {report}
      </View>
      <AppText variant="caption" tone="muted">
        Setup files import back into Tunefork; CSV opens in a spreadsheet.
      </AppText>
      {isOwner ? (
        <>
          <SetupConfirmButton
            label="Delete setup"
            question={`Delete “${title}”? It leaves your garage and its links stop working; its history is kept.`}
            confirmLabel="Yes, delete it"
            busyLabel="Deleting…"
            busy={deleting}
            onConfirm={onDelete}
          />
          <FormErrorBanner message={deleteError} />
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
