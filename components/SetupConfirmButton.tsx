import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';

export type SetupConfirmButtonProps = {
  label: string;
  /** What will happen, asked as a question before anything is removed. */
  question: string;
  confirmLabel: string;
  busyLabel: string;
  busy: boolean;
  onConfirm: () => void;
};

/** A removal in two presses: the first asks, the second does it, "Keep it" backs out. */
export function SetupConfirmButton({ label, question, confirmLabel, busyLabel, busy, onConfirm }: SetupConfirmButtonProps) {
  const [asking, setAsking] = useState(false);
  if (!asking) return <Button label={label} variant="danger" onPress={() => setAsking(true)} />;
  return (
    <View style={styles.ask}>
      <AppText role="alert">{question}</AppText>
      <View style={styles.row}>
        <Button label={confirmLabel} variant="danger" busy={busy} busyLabel={busyLabel} onPress={onConfirm} />
        <Button label="Keep it" variant="secondary" disabled={busy} onPress={() => setAsking(false)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  ask: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
