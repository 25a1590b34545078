import { router } from 'expo-router';
import { View } from 'react-native';
import { Card } from '../components/Card';
import { MyReportItem } from '../components/MyReportItem';
import { Screen } from '../components/Screen';
import { SignedInGate } from '../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../components/StatusViews';
import { signInHref, useMeQuery } from '../hooks/auth';
import { useMyReportsQuery } from '../hooks/reports';

function MyReports() {
  const reports = useMyReportsQuery();
  if (reports.isPending) return <LoadingState label="Loading your reports…" />;
  if (reports.isError) return <ErrorState title="Your reports could not load" message={reports.error.message} onRetry={() => void reports.refetch()} />;
  if (reports.data.length === 0) {
    return (
      <EmptyState
        title="No reports yet"
        message="When a setup, change note, comment, photo or profile breaks the rules, use its “Report” button. Each report and what came of it shows up here."
        actionLabel="Browse setups on Discover"
        onAction={() => router.push('/')}
      />
    );
  }
  return (
    <Card>
      <View role="list" aria-label="Your reports">
        {reports.data.map((report, i) => (
          <MyReportItem key={report.id} report={report} first={i === 0} />
        ))}
      </View>
    </Card>
  );
}

export default function MyReportsScreen() {
  const me = useMeQuery();
  return (
    <Screen title="My reports" subtitle="What you reported and what the moderators did about it." back={{ href: '/profile', label: 'Back to Profile' }}>
      <SignedInGate me={me} signInHref={signInHref('/reports')}>
        {() => <MyReports />}
      </SignedInGate>
    </Screen>
  );
}
