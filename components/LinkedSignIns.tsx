import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';

export type LinkedSignInsProps = {
  hasPassword: boolean;
  email: string | null;
  /** The GitHub account name when one is linked. */
  githubLogin: string | null;
  onLinkGithub: () => void;
  onUnlinkGithub: () => void;
  unlinking: boolean;
  /** Why the last unlink failed, e.g. it was the only way left to sign in. */
  error?: string | null;
};

function Method({ name, state, children }: { name: string; state: string; children?: ReactNode }) {
  return (
    <View style={styles.method}>
      <View style={styles.methodText}>
        <AppText style={styles.name}>{name}</AppText>
        <AppText variant="caption" tone="muted">
          {state}
        </AppText>
      </View>
      {children}
    </View>
  );
}

/** The ways into this account, with GitHub linkable and unlinkable. */
export function LinkedSignIns(props: LinkedSignInsProps) {
  const { hasPassword, email, githubLogin, onLinkGithub, onUnlinkGithub, unlinking, error } = props;
  const { colors } = useTheme();
  return (
    <View style={styles.list}>
      <FormErrorBanner message={error} />
      <Method
        name="E-mail and password"
        state={hasPassword ? `Signs in as ${email ?? 'your handle'}` : 'No password set; set one below to use it'}
      />
      <View style={[styles.rule, { backgroundColor: colors.border }]} />
      <Method name="GitHub" state={githubLogin ? `Linked to ${githubLogin}` : 'Not linked'}>
        {githubLogin ? (
          <Button
            label="Unlink"
            accessibilityLabel="Unlink GitHub"
            busyLabel="Unlinking…"
            busy={unlinking}
            variant="secondary"
            onPress={onUnlinkGithub}
          />
        ) : (
          <Button label="Link" accessibilityLabel="Link GitHub" variant="secondary" onPress={onLinkGithub} />
        )}
      </Method>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  method: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: layout.minTouchTarget },
  methodText: { flex: 1, gap: 2 },
  name: { fontWeight: '700' },
  rule: { height: 1 },
});
