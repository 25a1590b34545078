import { VISIBILITIES, type Visibility } from '../shared/types/setups';
import { SetupRadioList } from './SetupRadioList';

/** Who can open a setup, in the words the whole app uses for it. */
export const VISIBILITY_TEXT: Record<Visibility, { label: string; explanation: string }> = {
  private: { label: 'Private', explanation: 'Only you can open it.' },
  unlisted: { label: 'Unlisted, by link', explanation: 'Anyone you give the link to can read it; it is listed nowhere.' },
  public: { label: 'Public', explanation: 'Every racer can find and read it, signed in or not.' },
};

const OPTIONS = VISIBILITIES.map((v) => ({ value: v, label: VISIBILITY_TEXT[v].label, description: VISIBILITY_TEXT[v].explanation }));

export type VisibilityChoiceProps = {
  value: Visibility;
  onChange: (value: Visibility) => void;
  disabled?: boolean;
  /** Shown above the choices and used as the group's name. */
  label?: string;
};

/** Private, unlisted or public, each with one line on who can open the setup. */
export function VisibilityChoice({ value, onChange, disabled, label = 'Who can see it' }: VisibilityChoiceProps) {
  return <SetupRadioList label={label} options={OPTIONS} value={value} onChange={onChange} disabled={disabled} />;
}
