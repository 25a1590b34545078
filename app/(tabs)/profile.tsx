import { ComingSoon } from '../../components/ComingSoon';
import { Screen } from '../../components/Screen';

export default function ProfileScreen() {
  return (
    <Screen title="Profile" subtitle="Your racer page, settings and sign-in.">
      <ComingSoon
        heading="Accounts are next"
        points={[
          'Sign up with e-mail and password, or continue with GitHub',
          'Your public racer page: bio, home track and classes raced',
          'Units: millimetres or inches, °C or °F',
        ]}
      />
    </Screen>
  );
}
