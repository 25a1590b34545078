import { StyleSheet, View } from 'react-native';
import type { Me } from '../shared/types/auth';
import { space } from '../theme';
import { AppText } from './AppText';
import { Avatar } from './Avatar';
import { Card } from './Card';
import { RoleBadge } from './RoleBadge';

export type AccountCardProps = { me: Me };

/** The signed-in racer at a glance: who they are and how they sign in. */
export function AccountCard({ me }: AccountCardProps) {
  return (
    <Card>
      <View style={styles.row}>
        <Avatar displayName={me.displayName} size="large" />
        <View style={styles.names}>
          <AppText variant="heading">{me.displayName}</AppText>
          <AppText tone="muted">@{me.handle}</AppText>
          <RoleBadge role={me.role} />
        </View>
      </View>
      {me.email ? (
        <AppText variant="caption" tone="muted">
          {me.email}
          {me.emailVerified ? ' · confirmed' : ' · not confirmed yet'}
        </AppText>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.lg },
  names: { flex: 1, gap: 2 },
});
