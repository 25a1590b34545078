import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { copyText } from '../hooks/garageUi';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { StatusNote } from './StatusNote';

export type VisibilityShareLinkProps = { link: string };

/** The link that opens an unlisted setup, selectable everywhere and copyable where the browser allows. */
export function VisibilityShareLink({ link }: VisibilityShareLinkProps) {
  const { colors } = useTheme();
  const [copied, setCopied] = useState<boolean | null>(null);
  return (
    <View style={styles.group}>
      <AppText style={styles.bold}>Link to share</AppText>
      <View style={[styles.box, { borderColor: colors.border, backgroundColor: colors.surfaceRaised }]}>
        <AppText selectable>
          {link}
        </AppText>
      </View>
      {Platform.OS === 'web' ? (
        <Button label="Copy the link" variant="secondary" onPress={() => void copyText(link).then(setCopied)} />
      ) : null}
      <StatusNote
        message={copied === null ? null : copied ? 'Link copied.' : 'This browser would not copy it; select the link and copy it yourself.'}
        tone={copied ? 'success' : 'caution'}
      />
      <AppText variant="caption" tone="muted">
        Anyone with this link can read the setup. Make it private to stop the link working.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  bold: { fontWeight: '700' },
  box: { borderWidth: 1, borderRadius: radius.md, padding: space.md },
});
