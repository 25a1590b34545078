import { useNavigation } from 'expo-router';
import { useEffect, useRef, type RefObject } from 'react';
import { Alert, Platform } from 'react-native';

export const LEAVE_MESSAGE = 'Your changes to this sheet are not saved yet. Leave anyway and lose them?';

/** Asks before unsaved work is thrown away: the browser's own dialog on web, an alert on phones. */
export function confirmLeave(message: string = LEAVE_MESSAGE): Promise<boolean> {
  if (Platform.OS === 'web') return Promise.resolve(typeof window === 'undefined' || window.confirm(message));
  return new Promise((resolve) => {
    Alert.alert('Leave without saving?', message, [
      { text: 'Keep editing', style: 'cancel', onPress: () => resolve(false) },
      { text: 'Leave', style: 'destructive', onPress: () => resolve(true) },
    ], { cancelable: true, onDismiss: () => resolve(false) });
  });
}

export type UnsavedChangesGuardProps = {
  /** There is something to lose. */
  active: boolean;
  /**
   * Set to true once leaving is settled (the racer confirmed, or the save went through), so the
   * navigation that follows is not questioned a second time.
   */
  leaveApproved: RefObject<boolean>;
  /** The racer chose to leave without saving. */
  onDiscard?: () => void;
};

/** Warns before the page is closed or reloaded, and before the screen is popped off the stack. */
export function UnsavedChangesGuard({ active, leaveApproved, onDiscard }: UnsavedChangesGuardProps) {
  const navigation = useNavigation();
  // Held in a ref so a new callback on every render does not re-register the listener.
  const discard = useRef(onDiscard);
  useEffect(() => {
    discard.current = onDiscard;
  }, [onDiscard]);

  useEffect(() => {
    if (!active || Platform.OS !== 'web' || typeof window === 'undefined') return;
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      if (leaveApproved.current) return;
      event.preventDefault();
      // Older browsers only show their dialog when returnValue is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [active, leaveApproved]);

  useEffect(() => {
    if (!active) return;
    return navigation.addListener('beforeRemove', (event) => {
      if (leaveApproved.current) return;
      event.preventDefault();
      void confirmLeave().then((leave) => {
        if (!leave) return;
        leaveApproved.current = true;
        discard.current?.();
        navigation.dispatch(event.data.action);
      });
    });
  }, [active, navigation, leaveApproved]);

  return null;
}
