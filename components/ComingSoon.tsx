import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type ComingSoonProps = { heading: string; points: string[] };

/** Says plainly what a screen will hold once its feature lands. */
export function ComingSoon({ heading, points }: ComingSoonProps) {
  return (
    <Card>
      <AppText variant="heading">{heading}</AppText>
      <View role="list" style={styles.list}>
        {points.map((p) => (
          <AppText key={p} role="listitem" tone="muted">
            • {p}
          </AppText>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ list: { gap: space.xs } });
