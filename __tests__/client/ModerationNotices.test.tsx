import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { ActionOnMeItem } from '../../components/ActionOnMeItem';
import { AppealForm } from '../../components/AppealForm';
import { HiddenNoticeBanner } from '../../components/HiddenNoticeBanner';
import { limitsLiftText, NewAccountLimitsNotice } from '../../components/NewAccountLimitsNotice';
import { RevisionList } from '../../components/RevisionList';
import { SuspensionAppealCard, suspensionAppealToken } from '../../components/SuspensionAppealCard';
import { ApiRequestError } from '../../hooks/api';
import { actionOnMeFixture, limitsFixture } from './support/moderationFixtures';
import { setupFixture } from './support/historyFixtures';
import { renderThemed } from './support/render';

jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

describe('HiddenNoticeBanner', () => {
  const notice = { hiddenAt: '2026-12-01T10:00:00.000Z', reason: 'Spam or advertising.', autoHidden: false, actionId: 12 };

  it('tells the author who hid it, why, and offers the appeal', () => {
    renderThemed(<HiddenNoticeBanner notice={notice} what="setup" isAuthor />);
    expect(screen.getByText('Hidden by moderators')).toBeTruthy();
    expect(screen.getByText(/Only you and the moderators can see this setup/)).toBeTruthy();
    expect(screen.getByText('Reason: Spam or advertising.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Appeal' })).toBeTruthy();
  });

  it('offers no appeal to a moderator looking at someone else’s hidden setup', () => {
    renderThemed(<HiddenNoticeBanner notice={notice} what="setup" isAuthor={false} />);
    expect(screen.getByText(/Only its author and the moderators/)).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Appeal' })).toBeNull();
  });

  it('says an automatic hide waits for a moderator, with nothing to appeal yet', () => {
    renderThemed(<HiddenNoticeBanner notice={{ ...notice, autoHidden: true, actionId: null, reason: 'Reported by several racers' }} what="setup" isAuthor />);
    expect(screen.getByText('Hidden automatically while moderators review reports')).toBeTruthy();
    expect(screen.getByText(/A moderator will restore it or explain what is wrong/)).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Appeal' })).toBeNull();
  });
});

describe('NewAccountLimitsNotice', () => {
  it('lists the limits that matter for the form with this hour’s use', () => {
    const { rerender } = renderThemed(<NewAccountLimitsNotice limits={limitsFixture()} focus="comments" />);
    const lines = () => screen.getAllByRole('listitem').map((item) => item.props.children.join(''));
    expect(lines()).toEqual(['• Comments: 5 of 5 used this hour — wait a while before the next one.', '• Links: at most 2 in one note or comment.']);
    expect(screen.getByRole('link', { name: 'Verify your e-mail to lift the limits' })).toBeTruthy();
    rerender(<NewAccountLimitsNotice limits={limitsFixture()} focus="setups" />);
    expect(lines()).toEqual(['• New setups: 1 of 3 used this hour.', '• Links: at most 2 in one note or comment.']);
    rerender(<NewAccountLimitsNotice limits={limitsFixture()} focus="photos" />);
    expect(lines()).toEqual(['• Photos: open once your e-mail is verified.']);
  });

  it('says when the limits lift for each reason they apply', () => {
    expect(limitsLiftText(limitsFixture({ because: ['unverified'], ageLiftsAt: null }))).toBe('Verify your e-mail to lift them at once.');
    expect(limitsLiftText(limitsFixture({ because: ['new-account'] }))).toMatch(/^They lift on .+, when your account is a day old\.$/);
    expect(limitsLiftText(limitsFixture())).toMatch(/^They lift once your account is a day old \(.+\) and your e-mail is verified\.$/);
  });

  it('shows nothing when no limits apply', () => {
    renderThemed(<NewAccountLimitsNotice limits={limitsFixture({ limited: false, because: [] })} focus="setups" />);
    expect(screen.queryByLabelText('Limits for new accounts')).toBeNull();
  });
});

describe('AppealForm', () => {
  it('is closed for input, with the reason, when no appeal is possible', () => {
    const onSubmit = jest.fn(() => Promise.resolve());
    renderThemed(<AppealForm onSubmit={onSubmit} disabledReason="The 20 days to appeal ended on 21 December 2026." />);
    expect(screen.getByText('The 20 days to appeal ended on 21 December 2026.')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Send appeal' })).toBeDisabled();
    expect(screen.getByLabelText('Why should the decision change?').props.editable).toBe(false);
  });

  it('asks for words first, then shows the server’s refusal and keeps the text', async () => {
    const onSubmit = jest.fn(() => Promise.reject(new ApiRequestError(409, 'conflict', 'You already appealed this decision.')));
    renderThemed(<AppealForm onSubmit={onSubmit} />);
    fireEvent.press(screen.getByRole('button', { name: 'Send appeal' }));
    expect(await screen.findByText('Say why the decision should change.')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Why should the decision change?'), 'The link goes to our club’s own timing page.');
    fireEvent.press(screen.getByRole('button', { name: 'Send appeal' }));
    expect(await screen.findByText('You already appealed this decision.')).toBeTruthy();
    expect(onSubmit).toHaveBeenCalledWith('The link goes to our club’s own timing page.');
    expect(screen.getByLabelText('Why should the decision change?').props.value).toBe('The link goes to our club’s own timing page.');
  });
});

describe('ActionOnMeItem', () => {
  it('opens the appeal form straight away when arriving from an “Appeal” link', () => {
    renderThemed(<ActionOnMeItem action={actionOnMeFixture()} onAppeal={jest.fn()} startOpen />);
    expect(screen.getByText('Hidden by moderators')).toBeTruthy();
    expect(screen.getByLabelText('Your appeal')).toBeTruthy();
  });

  it('shows an appeal already sent instead of a second form', () => {
    const appeal = { id: 4, actionId: 12, text: 'Club page.', status: 'open' as const, decisionReason: null, createdAt: '2026-12-02T10:00:00.000Z', decidedAt: null };
    renderThemed(<ActionOnMeItem action={actionOnMeFixture({ canAppeal: false, cannotAppealReason: 'You already appealed this.', appeal })} onAppeal={jest.fn()} />);
    expect(screen.getByText('Appeal waiting')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Appeal/ })).toBeNull();
  });

  it('says why an appeal is no longer possible', () => {
    renderThemed(<ActionOnMeItem action={actionOnMeFixture({ canAppeal: false, cannotAppealReason: 'The 20 days to appeal have passed.' })} onAppeal={jest.fn()} />);
    expect(screen.getByText('The 20 days to appeal have passed.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Appeal/ })).toBeNull();
  });
});

describe('appealing a suspension at sign-in', () => {
  it('finds the appeal token only on a suspended sign-in refusal', () => {
    const suspended = new ApiRequestError(403, 'account_suspended', 'Your account is suspended.', { appealToken: 'tok-123', actionId: 9 });
    expect(suspensionAppealToken(suspended)).toBe('tok-123');
    expect(suspensionAppealToken(new ApiRequestError(401, 'invalid_credentials', 'Wrong password.'))).toBeNull();
    expect(suspensionAppealToken(new ApiRequestError(403, 'account_suspended', 'Suspended.'))).toBeNull();
  });

  it('sends the appeal text and confirms it went', async () => {
    const onSubmit = jest.fn(() => Promise.resolve());
    renderThemed(<SuspensionAppealCard onSubmit={onSubmit} />);
    fireEvent.press(screen.getByRole('button', { name: 'Appeal the suspension' }));
    fireEvent.changeText(screen.getByLabelText('Why should the suspension be lifted?'), 'My account was taken over; I changed the password.');
    fireEvent.press(screen.getByRole('button', { name: 'Send appeal' }));
    expect(await screen.findByText(/Your appeal was sent/)).toBeTruthy();
    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith('My account was taken over; I changed the password.'));
  });
});

describe('hidden change notes in a setup’s history', () => {
  it('marks a hidden note, shows its words to those who may read them, and says nothing of an empty one', () => {
    const [five, four, three] = setupFixture().revisions;
    renderThemed(
      <RevisionList revisions={[{ ...five, noteHidden: true }, { ...four, noteHidden: true, changeNote: '' }, three]} />,
    );
    expect(screen.getAllByText('Change note hidden by moderators')).toHaveLength(2);
    expect(screen.getByText('Change 5')).toBeTruthy();
    expect(screen.queryByText('No change note.')).toBeNull();
    expect(screen.getByText('Change 3')).toBeTruthy();
  });
});
