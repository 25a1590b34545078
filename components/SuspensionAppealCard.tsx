import { useState } from 'react';
import { ApiRequestError } from '../hooks/api';
import { APPEAL_WINDOW_DAYS } from '../shared/types/moderation';
import { AppealForm } from './AppealForm';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { StatusNote } from './StatusNote';

export type SuspensionAppealCardProps = {
  /** Resolves once the appeal was taken; rejects with the server's refusal. */
  onSubmit: (text: string) => Promise<unknown>;
};

/** The token a refused sign-in carries when the account is suspended and the suspension can be appealed. */
export function suspensionAppealToken(error: unknown): string | null {
  if (!(error instanceof ApiRequestError) || error.code !== 'account_suspended') return null;
  const token = error.details?.appealToken;
  return typeof token === 'string' && token.length > 0 ? token : null;
}

/** On the sign-in screen of a suspended racer: one appeal of the suspension, without a session. */
export function SuspensionAppealCard({ onSubmit }: SuspensionAppealCardProps) {
  const [open, setOpen] = useState(false);
  const [sent, setSent] = useState(false);
  if (sent) {
    return <StatusNote message="Your appeal was sent. A moderator who did not suspend you will decide; try signing in again later." />;
  }
  return (
    <Card role="region" aria-label="Appeal your suspension">
      <AppText variant="heading">Think the suspension is a mistake?</AppText>
      {open ? (
        <AppealForm
          label="Why should the suspension be lifted?"
          onSubmit={async (text) => {
            await onSubmit(text);
            setSent(true);
          }}
          onCancel={() => setOpen(false)}
        />
      ) : (
        <>
          <AppText tone="muted">You can appeal it once, within {APPEAL_WINDOW_DAYS} days of the suspension.</AppText>
          <Button label="Appeal the suspension" variant="secondary" onPress={() => setOpen(true)} />
        </>
      )}
    </Card>
  );
}
