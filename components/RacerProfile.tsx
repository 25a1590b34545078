import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { PublicRacer } from '../shared/types/auth';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Avatar } from './Avatar';
import { Card } from './Card';
import { HtmlContent } from './HtmlContent';
import { RoleBadge } from './RoleBadge';

export type RacerProfileProps = { racer: PublicRacer };

/** "March 2025": a month is as precise as a public page needs to be about someone's sign-up. */
export function joinedLabel(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '';
  return date.toLocaleDateString(undefined, { year: 'numeric', month: 'long' });
}

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={styles.fact}>
      <AppText variant="caption" tone="muted">
        {label}
      </AppText>
      {children}
    </View>
  );
}

/** A racer's public page: who they are, where they race, what they race, in their own words. */
export function RacerProfile({ racer }: RacerProfileProps) {
  const { colors } = useTheme();
  const joined = joinedLabel(racer.joinedAt);
  return (
    <>
      <Card>
        <View style={styles.header}>
          <Avatar displayName={racer.displayName} size="large" />
          <View style={styles.names}>
            <AppText tone="muted">@{racer.handle}</AppText>
            <RoleBadge role={racer.role} />
            {joined ? (
              <AppText variant="caption" tone="muted">
                Racing with Tunefork since {joined}
              </AppText>
            ) : null}
          </View>
        </View>
        <Fact label="Home track">
          <AppText>{racer.homeTrack || 'Not set yet'}</AppText>
        </Fact>
        <Fact label="Classes raced">
          {racer.classesRaced.length === 0 ? (
            <AppText>None listed yet</AppText>
          ) : (
            <View role="list" style={styles.classes}>
              {racer.classesRaced.map((key) => (
                <View key={key} role="listitem" style={[styles.classChip, { backgroundColor: colors.accentSoft }]}>
                  <AppText variant="caption" style={{ color: colors.accent }}>
                    {vehicleClassLabel(key)}
                  </AppText>
                </View>
              ))}
            </View>
          )}
        </Fact>
      </Card>
      <Card>
        <AppText variant="heading">About</AppText>
        {racer.bioHtml.trim() ? <HtmlContent html={racer.bioHtml} /> : <AppText tone="muted">No bio yet.</AppText>}
      </Card>
    </>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', alignItems: 'center', gap: space.lg, marginBottom: space.sm },
  names: { flex: 1, gap: space.xs },
  fact: { gap: 2 },
  classes: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  classChip: { borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 2 },
});
