import { useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';
import { ActionOnMeItem } from '../../components/ActionOnMeItem';
import { Card } from '../../components/Card';
import { Screen } from '../../components/Screen';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useActionsOnMeQuery, useCreateAppeal } from '../../hooks/moderation';

function ActionsOnMe({ focusId }: { focusId: number | null }) {
  const actions = useActionsOnMeQuery();
  const appeal = useCreateAppeal();
  if (actions.isPending) return <LoadingState label="Loading moderation of your posts…" />;
  if (actions.isError) return <ErrorState title="This list could not load" message={actions.error.message} onRetry={() => void actions.refetch()} />;
  if (actions.data.length === 0) {
    return <EmptyState title="Nothing here" message="No moderator has acted on your setups, comments, photos or profile. If one ever does, it shows here with the reason and a way to appeal." />;
  }
  return (
    <Card>
      <View role="list" aria-label="Moderation of your posts">
        {actions.data.map((action, i) => (
          <ActionOnMeItem
            key={action.id}
            action={action}
            first={i === 0}
            startOpen={action.id === focusId}
            onAppeal={(text) => appeal.mutateAsync({ actionId: action.id, text })}
          />
        ))}
      </View>
    </Card>
  );
}

export default function ModerationOfMyPostsScreen() {
  const params = useLocalSearchParams<{ action?: string }>();
  const focusId = typeof params.action === 'string' && /^\d+$/.test(params.action) ? Number(params.action) : null;
  const me = useMeQuery();
  const here = focusId ? `/moderation/mine?action=${focusId}` : '/moderation/mine';
  return (
    <Screen
      title="Moderation of my posts"
      subtitle="What moderators did about your posts or account, why, and your appeals."
      back={{ href: '/profile', label: 'Back to Profile' }}
    >
      <SignedInGate me={me} signInHref={signInHref(here)}>
        {() => <ActionsOnMe focusId={focusId} />}
      </SignedInGate>
    </Screen>
  );
}
