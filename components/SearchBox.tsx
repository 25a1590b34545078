import { Pressable, StyleSheet } from 'react-native';
import { layout, space } from '../theme';
import { AppText } from './AppText';
import { TextField } from './TextField';

export type SearchBoxProps = {
  value: string;
  onChange: (text: string) => void;
};

export const SEARCH_HINT = 'Titles, notes, kits, makers and racers. "Quotes" keep words together; -word leaves it out.';

/** The search field of Discover, with a way to clear it. */
export function SearchBox({ value, onChange }: SearchBoxProps) {
  return (
    <TextField
      label="Search setups"
      hint={SEARCH_HINT}
      value={value}
      onChangeText={onChange}
      placeholder="e.g. Stoat 8E loose dusty"
      returnKeyType="search"
      autoCapitalize="none"
      autoCorrect={false}
      maxLength={200}
      accessory={
        value ? (
          <Pressable role="button" aria-label="Empty the search box" onPress={() => onChange('')} style={styles.clear}>
            <AppText tone="muted" aria-hidden>
              ✕
            </AppText>
          </Pressable>
        ) : null
      }
    />
  );
}

const styles = StyleSheet.create({
  clear: { minWidth: layout.minTouchTarget, minHeight: layout.minTouchTarget, alignItems: 'center', justifyContent: 'center', paddingHorizontal: space.sm },
});
