import { StyleSheet } from 'react-native';
import { layout, radius, space } from './tokens';

/** The rounded action shape shared by buttons, button-looking links and download links. */
export const pillStyles = StyleSheet.create({
  button: {
    minHeight: layout.minTouchTarget,
    minWidth: layout.minTouchTarget,
    paddingHorizontal: space.lg,
    borderRadius: radius.pill,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
    alignSelf: 'flex-start',
  },
  label: { fontWeight: '700' },
});
