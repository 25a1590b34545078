import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiMutate, apiRequest } from '../hooks/api';
import { describeError } from '../hooks/form';
import { STALE } from '../hooks/queryClient';
import {
  emailPreferencesResponseSchema,
  type EmailPreferences,
  type EmailPreferencesUpdate,
} from '../shared/types/community';
import { EmailPreferencesForm } from './EmailPreferencesForm';
import { SettingsSection } from './SettingsSection';
import { ErrorState, LoadingState } from './StatusViews';

export const emailPreferencesKeys = {
  all: ['email-preferences'] as const,
  mine: () => [...emailPreferencesKeys.all, 'mine'] as const,
};

/** My e-mail preferences. They change through my own saves (or an unsubscribe link, rarely). */
export function useEmailPreferencesQuery() {
  return useQuery({
    queryKey: emailPreferencesKeys.mine(),
    queryFn: async ({ signal }) => (await apiRequest('/me/email-preferences', { schema: emailPreferencesResponseSchema, signal })).preferences,
    staleTime: STALE.session,
  });
}

/** Saves one change; the answer (the whole preferences) replaces the cached copy. */
export function useUpdateEmailPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (update: EmailPreferencesUpdate) =>
      (await apiMutate('/me/email-preferences', { method: 'PUT', body: update, schema: emailPreferencesResponseSchema })).preferences,
    onSuccess: (preferences) => queryClient.setQueryData<EmailPreferences>(emailPreferencesKeys.mine(), preferences),
  });
}

/** What the screen shows while a save is under way: the saved preferences with the change applied. */
function withPending(saved: EmailPreferences, update: EmailPreferencesUpdate | undefined): EmailPreferences {
  if (!update) return saved;
  return {
    enabled: update.enabled ?? saved.enabled,
    delivery: update.delivery ?? saved.delivery,
    types: { ...saved.types, ...update.types },
  };
}

export type EmailPreferencesSectionProps = { emailConfirmed: boolean };

/** The settings section for notification e-mail: loads, shows and saves the racer's choices. */
export function EmailPreferencesSection({ emailConfirmed }: EmailPreferencesSectionProps) {
  const query = useEmailPreferencesQuery();
  const save = useUpdateEmailPreferences();
  const title = 'Notification e-mail';
  const description = 'What Tunefork e-mails you about. Saved as soon as you choose; every e-mail has a link to stop it.';
  if (query.isPending) {
    return (
      <SettingsSection title={title} description={description}>
        <LoadingState label="Loading your e-mail settings…" />
      </SettingsSection>
    );
  }
  if (query.isError) {
    return (
      <SettingsSection title={title} description={description}>
        <ErrorState title="Your e-mail settings did not load" message={describeError(query.error, []).formError ?? query.error.message} onRetry={() => void query.refetch()} />
      </SettingsSection>
    );
  }
  return (
    <SettingsSection title={title} description={description}>
      <EmailPreferencesForm
        preferences={withPending(query.data, save.isPending ? save.variables : undefined)}
        emailConfirmed={emailConfirmed}
        onChange={(update) => save.mutate(update)}
        disabled={save.isPending}
        error={describeError(save.error, []).formError}
        savedMessage={save.isSuccess ? 'E-mail settings saved.' : null}
      />
    </SettingsSection>
  );
}
