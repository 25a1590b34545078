import { createElement } from 'react';
import { Linking, Platform, Pressable } from 'react-native';
import { apiUrl } from '../hooks/api';
import { fonts, layout, pillStyles, radius, space, type as typeScale, useTheme } from '../theme';
import { AppText } from './AppText';

export type SetupExportLinkProps = {
  /** An API path such as /setups/4/export.csv?share=… */
  path: string;
  label: string;
};

/**
 * A download from the API. On web it is a real link with `download`, so the browser saves the file
 * and "save link as" works; elsewhere the system opens the address.
 */
export function SetupExportLink({ path, label }: SetupExportLinkProps) {
  const { colors } = useTheme();
  const href = apiUrl(path);
  if (Platform.OS === 'web') {
    return createElement(
      'a',
      {
        href,
        download: '',
        // Plain CSS, since this element bypasses react-native-web's style translation.
        style: {
          display: 'inline-flex',
          alignItems: 'center',
          justifyContent: 'center',
          alignSelf: 'flex-start',
          boxSizing: 'border-box',
          minHeight: layout.minTouchTarget,
          minWidth: layout.minTouchTarget,
          paddingLeft: space.lg,
          paddingRight: space.lg,
          borderRadius: radius.pill,
          borderWidth: 1,
          borderStyle: 'solid',
          borderColor: colors.accent,
          backgroundColor: colors.surface,
          color: colors.accent,
          fontFamily: fonts.bold,
          fontSize: typeScale.body.fontSize,
          textDecoration: 'none',
        },
      },
      label,
    );
  }
  return (
    <Pressable
      role="link"
      aria-label={label}
      onPress={() => void Linking.openURL(href)}
      style={[styles.button, { borderColor: colors.accent, backgroundColor: colors.surface }]}
    >
      <AppText style={[styles.label, { color: colors.accent }]}>{label}</AppText>
    </Pressable>
  );
}

const styles = pillStyles;
