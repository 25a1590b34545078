import { StyleSheet, View } from 'react-native';
import type { MyLimits } from '../shared/types/moderation';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { TextLink } from './TextLink';

export type LimitFocus = 'setups' | 'comments' | 'photos';

export type NewAccountLimitsNoticeProps = {
  limits: MyLimits;
  /** Which limits matter on this screen: only those are listed. */
  focus: LimitFocus;
  /** Where the racer confirms their e-mail (the profile page offers the link again). */
  verifyHref?: string;
};

function liftTime(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '';
  return date.toLocaleString(undefined, { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
}

/** When the limits go away, in one sentence. */
export function limitsLiftText(limits: MyLimits): string {
  const young = limits.because.includes('new-account') && limits.ageLiftsAt;
  const unverified = limits.because.includes('unverified');
  if (young && unverified) return `They lift once your account is a day old (${liftTime(limits.ageLiftsAt!)}) and your e-mail is verified.`;
  if (young) return `They lift on ${liftTime(limits.ageLiftsAt!)}, when your account is a day old.`;
  return 'Verify your e-mail to lift them at once.';
}

function usage(kind: string, limit: { perHour: number; usedThisHour: number }): string {
  const left = Math.max(0, limit.perHour - limit.usedThisHour);
  const base = `${kind}: ${limit.usedThisHour} of ${limit.perHour} used this hour`;
  return left === 0 ? `${base} — wait a while before the next one.` : `${base}.`;
}

function lines(limits: MyLimits, focus: LimitFocus): string[] {
  const setups = limits.setups ? usage('New setups', limits.setups) : null;
  const comments = limits.comments ? usage('Comments', limits.comments) : null;
  const photos = limits.photosAllowed ? null : 'Photos: open once your e-mail is verified.';
  const links = limits.linksPerPost === null ? null : `Links: at most ${limits.linksPerPost} in one note or comment.`;
  // Only what this form is about: a comment box need not talk about photos.
  const relevant = focus === 'setups' ? [setups, links] : focus === 'comments' ? [comments, links] : [photos];
  return relevant.filter((line): line is string => line !== null);
}

/**
 * New accounts post under a few limits against spam. Shown before the racer meets them: what they
 * are, how much of this hour's allowance is used, and when they lift. Nothing renders when none apply.
 */
export function NewAccountLimitsNotice({ limits, focus, verifyHref = '/profile' }: NewAccountLimitsNoticeProps) {
  const { colors } = useTheme();
  if (!limits.limited) return null;
  const shown = lines(limits, focus);
  return (
    <View role="region" aria-label="Limits for new accounts" style={[styles.notice, { backgroundColor: colors.accentSoft, borderColor: colors.accent }]}>
      <AppText style={styles.bold}>A few limits apply while your account is new</AppText>
      <View role="list" style={styles.list}>
        {shown.map((line) => (
          <AppText key={line} role="listitem">
            • {line}
          </AppText>
        ))}
      </View>
      <AppText tone="muted">{limitsLiftText(limits)}</AppText>
      {limits.because.includes('unverified') ? <TextLink href={verifyHref} label="Verify your e-mail to lift the limits" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  notice: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md, gap: space.xs },
  bold: { fontWeight: '700' },
  list: { gap: 2 },
});
