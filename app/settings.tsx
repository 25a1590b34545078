import { router, useLocalSearchParams } from 'expo-router';
import { EmailChangeForm } from '../components/EmailChangeForm';
import { EmailPreferencesSection } from '../components/EmailPreferencesSection';
import { FormErrorBanner } from '../components/FormErrorBanner';
import { LinkedSignIns } from '../components/LinkedSignIns';
import { PasswordChangeForm } from '../components/PasswordChangeForm';
import { ProfileForm } from '../components/ProfileForm';
import { Screen } from '../components/Screen';
import { SessionActions } from '../components/SessionActions';
import { SettingsSection } from '../components/SettingsSection';
import { SignedInGate } from '../components/SignedInGate';
import { StatusNote } from '../components/StatusNote';
import { UnitsPicker } from '../components/UnitsPicker';
import { linkGithub, signInHref, useMeQuery, useSignOut, useSignOutEverywhere } from '../hooks/auth';
import { describeError } from '../hooks/form';
import { useChangeEmail, useChangePassword, useUnlinkGithub, useUpdateProfile } from '../hooks/profile';
import type { Me } from '../shared/types/auth';

function formError(error: unknown): string | null {
  return describeError(error, []).formError;
}

function ProfileAndUnits({ me }: { me: Me }) {
  const profile = useUpdateProfile();
  // Units save on their own the moment a chip is pressed, so they get their own request state.
  const units = useUpdateProfile();
  const shownUnits = units.isPending && units.variables.units ? units.variables.units : me.units;
  return (
    <>
      <SettingsSection title="Public profile" description="Shown on your racer page.">
        <ProfileForm
          me={me}
          onSubmit={(values) => profile.mutateAsync(values)}
          pending={profile.isPending}
          error={profile.error}
          savedMessage={profile.isSuccess ? 'Profile saved.' : null}
        />
      </SettingsSection>
      <SettingsSection title="Units" description="How setup sheets show lengths and temperatures. Saved as soon as you choose.">
        <UnitsPicker value={shownUnits} onChange={(value) => units.mutate({ units: value })} disabled={units.isPending} />
        <FormErrorBanner message={formError(units.error)} />
        <StatusNote message={units.isSuccess ? 'Units saved.' : null} />
      </SettingsSection>
    </>
  );
}

function Account({ me }: { me: Me }) {
  const email = useChangeEmail();
  const password = useChangePassword();
  return (
    <>
      <SettingsSection title="E-mail address" description="The new address takes over once you open the link we mail to it.">
        <EmailChangeForm
          currentEmail={me.email}
          pendingEmail={me.pendingEmail}
          askPassword={me.hasPassword}
          onSubmit={(values) => email.mutateAsync(values)}
          pending={email.isPending}
          error={email.error}
          sentMessage={email.data?.message}
        />
      </SettingsSection>
      <SettingsSection title={me.hasPassword ? 'Password' : 'Set a password'}>
        <PasswordChangeForm
          hasPassword={me.hasPassword}
          onSubmit={(values) => password.mutateAsync(values)}
          pending={password.isPending}
          error={password.error}
          savedMessage={password.data?.message}
        />
      </SettingsSection>
    </>
  );
}

function SignInMethods({ me, linkError }: { me: Me; linkError: string | null }) {
  const unlink = useUnlinkGithub();
  const signOut = useSignOut();
  const everywhere = useSignOutEverywhere();
  // Leave for Profile at once; otherwise this screen would send the signed-out racer to sign-in.
  const toProfile = { onSuccess: () => router.replace('/profile') };
  return (
    <>
      <SettingsSection title="Ways to sign in">
        <LinkedSignIns
          hasPassword={me.hasPassword}
          email={me.email}
          githubLogin={me.githubLogin}
          onLinkGithub={linkGithub}
          onUnlinkGithub={() => unlink.mutate()}
          unlinking={unlink.isPending}
          error={formError(unlink.error) ?? linkError}
        />
      </SettingsSection>
      <SettingsSection title="Sessions">
        <SessionActions
          onSignOut={() => signOut.mutate(undefined, toProfile)}
          onSignOutEverywhere={() => everywhere.mutate(undefined, toProfile)}
          signingOut={signOut.isPending}
          signingOutEverywhere={everywhere.isPending}
          error={formError(signOut.error ?? everywhere.error)}
        />
      </SettingsSection>
    </>
  );
}

export default function SettingsScreen() {
  // The GitHub linking round trip reports a failure back here as ?error=.
  const { error } = useLocalSearchParams<{ error?: string }>();
  const me = useMeQuery();
  return (
    <Screen title="Settings" subtitle="Your public profile, units, e-mail and how you sign in." back={{ href: '/profile', label: 'Back to Profile' }}>
      <SignedInGate me={me} signInHref={signInHref('/settings')}>
        {(signedIn) => (
          <>
            <ProfileAndUnits me={signedIn} />
            <Account me={signedIn} />
            <EmailPreferencesSection emailConfirmed={signedIn.emailVerified} />
            <SignInMethods me={signedIn} linkError={typeof error === 'string' ? error : null} />
          </>
        )}
      </SignedInGate>
    </Screen>
  );
}
