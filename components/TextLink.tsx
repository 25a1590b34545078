import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { layout } from '../theme';
import { AppText } from './AppText';

export type TextLinkProps = {
  href: Href;
  label: string;
  /** Go back down the stack to `href` when it is there, instead of stacking another copy. */
  dismissTo?: boolean;
};

/** An in-app link styled as text, with a full-size touch target. */
export function TextLink({ href, label, dismissTo }: TextLinkProps) {
  return (
    <Link href={href} dismissTo={dismissTo} asChild>
      <Pressable role="link" aria-label={label} style={styles.target}>
        <AppText tone="accent" style={styles.text}>
          {label}
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  target: { minHeight: layout.minTouchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  text: { textDecorationLine: 'underline' },
});
