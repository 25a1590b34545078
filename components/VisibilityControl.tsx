import { Card } from './Card';
import { AppText } from './AppText';
import { FormErrorBanner } from './FormErrorBanner';
import { VisibilityChoice } from './VisibilityChoice';
import { VisibilityShareLink } from './VisibilityShareLink';
import type { Visibility } from '../shared/types/setups';

export type VisibilityControlProps = {
  value: Visibility;
  onChange: (value: Visibility) => void;
  pending: boolean;
  error: string | null;
  /** The unlisted setup's link, once the server has handed out its share code. */
  shareLink: string | null;
};

/** The owner's say over who can open the setup; saved the moment a choice is pressed. */
export function VisibilityControl({ value, onChange, pending, error, shareLink }: VisibilityControlProps) {
  return (
    <Card>
      <AppText variant="heading">Sharing</AppText>
      <VisibilityChoice value={value} onChange={onChange} disabled={pending} label="Who can see this setup" />
      <FormErrorBanner message={error} />
      {value === 'unlisted' && shareLink ? <VisibilityShareLink link={shareLink} /> : null}
    </Card>
  );
}
