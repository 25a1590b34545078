import { router, type Href } from 'expo-router';
import type { RefObject } from 'react';
import { Pressable, StyleSheet } from 'react-native';
import { layout } from '../theme';
import { AppText } from './AppText';
import { confirmLeave } from './UnsavedChangesGuard';

export type UnsavedLeaveLinkProps = {
  href: Href;
  label: string;
  /** Ask first when there is something to lose. */
  dirty: boolean;
  leaveApproved: RefObject<boolean>;
  /** The racer confirmed leaving with changes: they are not wanted back. */
  onDiscard?: () => void;
};

/** A way back that asks before throwing away unsaved changes. */
export function UnsavedLeaveLink({ href, label, dirty, leaveApproved, onDiscard }: UnsavedLeaveLinkProps) {
  const leave = async () => {
    if (dirty && !(await confirmLeave())) return;
    if (dirty) onDiscard?.();
    leaveApproved.current = true;
    router.dismissTo(href);
  };
  return (
    <Pressable role="link" aria-label={label} onPress={() => void leave()} style={styles.target}>
      <AppText tone="accent" style={styles.text}>
        {label}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  target: { minHeight: layout.minTouchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  text: { textDecorationLine: 'underline' },
});
