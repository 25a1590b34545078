import { ComingSoon } from '../../components/ComingSoon';
import { Screen } from '../../components/Screen';

export default function GarageScreen() {
  return (
    <Screen title="Garage" subtitle="Your cars, their setup sheets and every change you made.">
      <ComingSoon
        heading="Coming to your garage"
        points={[
          'Add a car from its kit and start from the stock setup',
          'Save every change as a revision with the reason you made it',
          'Fork a proven setup and take the original’s later changes one field at a time',
          'Log track days and lap times to see whether a change really helped',
        ]}
      />
    </Screen>
  );
}
