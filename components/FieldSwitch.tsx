import { StyleSheet, Switch, View } from 'react-native';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type FieldSwitchProps = {
  label: string;
  value: boolean | undefined;
  onChange: (value: boolean) => void;
};

/** Yes or no, with the answer written beside the switch so it does not rest on colour. */
export function FieldSwitch({ label, value, onChange }: FieldSwitchProps) {
  const { colors } = useTheme();
  return (
    <View style={styles.row}>
      {/* No role here: on the web the switch already renders a labelled native control inside. */}
      <Switch
        aria-label={label}
        value={value === true}
        onValueChange={onChange}
        trackColor={{ true: colors.accent, false: colors.border }}
        thumbColor={colors.surface}
      />
      <AppText aria-hidden>{value === undefined ? 'Not set' : value ? 'Yes' : 'No'}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: layout.minTouchTarget },
});
