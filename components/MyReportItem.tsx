import { StyleSheet, View } from 'react-native';
import { REPORT_REASON_LABELS, REPORT_TARGET_LABELS, type MyReport } from '../shared/types/moderation';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { ModerationPill } from './ModerationPill';
import { formatDay } from './SetupSheetFormat';
import { TextLink } from './TextLink';

export type MyReportItemProps = { report: MyReport; first?: boolean };

/** The outcome in plain words, or that it is still waiting. */
export function reportOutcomeText(report: MyReport): string {
  if (report.status === 'open') return 'Waiting for a moderator to look at it.';
  return report.outcomeText ?? 'A moderator looked at it.';
}

/** One of my reports: what, why, when, and what came of it. */
export function MyReportItem({ report, first }: MyReportItemProps) {
  const { colors } = useTheme();
  const open = report.status === 'open';
  return (
    <View role="listitem" style={[styles.item, first ? null : { borderTopWidth: 1, borderColor: colors.border }]}>
      <View style={styles.head}>
        <ModerationPill label={open ? 'Open' : 'Resolved'} tone={open ? 'waiting' : 'settled'} />
        <AppText variant="caption" tone="muted">
          {REPORT_TARGET_LABELS[report.targetType]} · reported {formatDay(report.createdAt)}
          {report.resolvedAt ? ` · resolved ${formatDay(report.resolvedAt)}` : ''}
        </AppText>
      </View>
      {report.targetPath ? <TextLink href={report.targetPath} label={report.targetLabel} /> : <AppText style={styles.bold}>{report.targetLabel}</AppText>}
      <AppText>
        <AppText style={styles.bold}>Your reason: </AppText>
        {REPORT_REASON_LABELS[report.reason].label}
        {report.note ? ` — “${report.note}”` : ''}
      </AppText>
      <AppText tone={open ? 'muted' : 'success'}>{reportOutcomeText(report)}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  item: { paddingVertical: space.md, gap: space.xs },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  bold: { fontWeight: '700' },
});
