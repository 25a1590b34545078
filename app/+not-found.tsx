import { Link } from 'expo-router';
import { AppText } from '../components/AppText';
import { Screen } from '../components/Screen';

export default function NotFoundScreen() {
  return (
    <Screen title="Nothing here" subtitle="That page does not exist, or it moved.">
      <Link href="/" style={{ minHeight: 44 }}>
        <AppText tone="accent">Go to Discover</AppText>
      </Link>
    </Screen>
  );
}
