import { ComingSoon } from '../../components/ComingSoon';
import { Screen } from '../../components/Screen';

export default function ActivityScreen() {
  return (
    <Screen title="Activity" subtitle="What the racers you follow changed, and who forked your setups.">
      <ComingSoon
        heading="Your feed will show"
        points={[
          'New public setups and revisions from racers you follow, with their change notes',
          'Forks of your setups and comments on your changes',
          'Changes to the originals you forked from',
        ]}
      />
    </Screen>
  );
}
