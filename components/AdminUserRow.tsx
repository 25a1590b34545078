import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ROLES, type AdminUser, type Role } from '../shared/types/auth';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';
import { FormErrorBanner } from './FormErrorBanner';
import { roleLabel } from './RoleBadge';
import { SuspendForm } from './SuspendForm';

export type AdminUserRowProps = {
  user: AdminUser;
  onChangeRole: (role: Role) => void;
  onSuspend: (values: { until: string | null; reason: string }) => Promise<unknown> | unknown;
  onUnsuspend: () => void;
  /** Which of this row's actions is waiting for the server, if any. */
  pending: 'role' | 'suspend' | 'unsuspend' | null;
  /** The last failure of this row's role or unsuspend action, in words. */
  error: string | null;
  /** The last failure of suspending this user, with its field details. */
  suspendError: unknown;
  /** The first row draws no rule above itself. */
  first?: boolean;
};

const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: roleLabel(role) }));

/** Human wording for a suspension; null when the racer is not suspended. */
export function suspensionText(user: AdminUser): string | null {
  const reason = user.suspensionReason ? ` Reason: ${user.suspensionReason}` : '';
  if (user.suspendedIndefinitely) return `Suspended until an admin lifts it.${reason}`;
  if (user.suspendedUntil && new Date(user.suspendedUntil) > new Date())
    return `Suspended until ${new Date(user.suspendedUntil).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' })}.${reason}`;
  return null;
}

/** One account in the admin list: who it is, its role, and suspension controls. */
export function AdminUserRow(props: AdminUserRowProps) {
  const { user, onChangeRole, onSuspend, onUnsuspend, pending, error, suspendError, first } = props;
  const { colors } = useTheme();
  const [suspending, setSuspending] = useState(false);
  const suspension = suspensionText(user);
  return (
    <View role="listitem" style={[styles.row, first ? styles.firstRow : { borderTopWidth: 1, borderColor: colors.border }]}>
      <View style={styles.names}>
        <AppText style={styles.name}>{user.displayName}</AppText>
        <AppText variant="caption" tone="muted">
          @{user.handle}
          {user.email ? ` · ${user.email}${user.emailVerified ? '' : ' (not confirmed)'}` : ''}
        </AppText>
      </View>
      {suspension ? <AppText tone="danger">{suspension}</AppText> : null}
      <FormErrorBanner message={error} />
      <ChoiceChips
        label={`Role of @${user.handle}`}
        options={ROLE_OPTIONS}
        selected={[user.role]}
        onChange={([role]) => onChangeRole(role)}
        disabled={pending !== null}
      />
      {suspending ? (
        <SuspendForm
          handle={user.handle}
          pending={pending === 'suspend'}
          error={suspendError}
          onCancel={() => setSuspending(false)}
          onSubmit={async (values) => {
            await onSuspend(values);
            setSuspending(false);
          }}
        />
      ) : (
        <View style={styles.actions}>
          {suspension ? (
            <Button
              label="Lift suspension"
              accessibilityLabel={`Lift the suspension of @${user.handle}`}
              busyLabel="Lifting…"
              busy={pending === 'unsuspend'}
              variant="secondary"
              onPress={onUnsuspend}
            />
          ) : null}
          <Button
            label={suspension ? 'Change suspension' : 'Suspend…'}
            accessibilityLabel={`${suspension ? 'Change the suspension of' : 'Suspend'} @${user.handle}`}
            variant="danger"
            disabled={pending !== null}
            onPress={() => setSuspending(true)}
          />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: space.lg, gap: space.md },
  firstRow: { paddingTop: 0 },
  names: { gap: 2 },
  name: { fontWeight: '700' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
