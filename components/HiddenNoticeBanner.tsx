import { StyleSheet, View } from 'react-native';
import { APPEAL_WINDOW_DAYS, type HiddenNotice } from '../shared/types/moderation';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { formatDay } from './SetupSheetFormat';

export type HiddenNoticeBannerProps = {
  notice: HiddenNotice;
  /** "setup", "photo": what is hidden, in words. */
  what: string;
  /** The author sees how to appeal; moderators looking at someone else's post do not. */
  isAuthor: boolean;
};

/** Where the author appeals one action (the list opens that action's form). */
export function appealHref(actionId: number): string {
  return `/moderation/mine?action=${actionId}`;
}

/**
 * Tells the author (and moderators) that a post is hidden from everyone else: who hid it (the
 * moderators, or the report threshold pending review), why, and how to appeal.
 */
export function HiddenNoticeBanner({ notice, what, isAuthor }: HiddenNoticeBannerProps) {
  const { colors } = useTheme();
  const title = notice.autoHidden ? 'Hidden automatically while moderators review reports' : 'Hidden by moderators';
  const who = isAuthor ? `Only you and the moderators can see this ${what}.` : `Only its author and the moderators can see this ${what}.`;
  return (
    <View role="region" aria-label={title} style={[styles.banner, { backgroundColor: colors.cautionSoft, borderColor: colors.caution }]}>
      <AppText role="heading" aria-level={2} style={[styles.title, { color: colors.caution }]}>
        {title}
      </AppText>
      <AppText style={{ color: colors.caution }}>
        {notice.autoHidden
          ? `Several racers reported it on ${formatDay(notice.hiddenAt)}. ${who} A moderator will restore it or explain what is wrong.`
          : `Since ${formatDay(notice.hiddenAt)}. ${who}`}
      </AppText>
      {notice.autoHidden ? null : (
        <AppText style={{ color: colors.caution }}>
          <AppText style={[styles.title, { color: colors.caution }]}>Reason: </AppText>
          {notice.reason}
        </AppText>
      )}
      {/* An automatic hide is reviewed by a moderator anyway; appeals are for a moderator's decision. */}
      {isAuthor && !notice.autoHidden && notice.actionId !== null ? (
        <View style={styles.row}>
          <AppText variant="caption" style={{ color: colors.caution }}>
            Think this is a mistake? You can appeal once, within {APPEAL_WINDOW_DAYS} days.
          </AppText>
          <ButtonLink href={appealHref(notice.actionId)} label="Appeal" variant="secondary" />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.lg, gap: space.sm },
  title: { fontWeight: '700' },
  row: { gap: space.sm },
});
