import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type FormErrorBannerProps = {
  /** Nothing renders while this is null or empty. */
  message: string | null | undefined;
};

/** A problem with the form as a whole (wrong password, too many attempts), announced at once. */
export function FormErrorBanner({ message }: FormErrorBannerProps) {
  const { colors } = useTheme();
  if (!message) return null;
  return (
    <View style={[styles.banner, { backgroundColor: colors.dangerSoft, borderColor: colors.danger }]}>
      {/* The role sits on the text so every platform reads the message itself out. */}
      <AppText role="alert" style={{ color: colors.danger }}>
        {message}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md },
});
