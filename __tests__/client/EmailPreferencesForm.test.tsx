import { fireEvent, screen } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { EmailPreferencesForm } from '../../components/EmailPreferencesForm';
import { EmailPreferencesUnsubscribe } from '../../components/EmailPreferencesUnsubscribe';
import { DEFAULT_EMAIL_PREFERENCES, type EmailPreferences } from '../../shared/types/community';
import { renderThemed } from './support/render';

// The router's Link needs a navigation tree; here it only passes the address on to its child.
jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

const withReplyOff: EmailPreferences = { ...DEFAULT_EMAIL_PREFERENCES, types: { ...DEFAULT_EMAIL_PREFERENCES.types, 'comment-reply': false } };

describe('EmailPreferencesForm (settings, notification e-mail)', () => {
  it('shows each type as chosen or not, and saves only the type pressed', () => {
    const onChange = jest.fn();
    renderThemed(<EmailPreferencesForm preferences={withReplyOff} emailConfirmed onChange={onChange} />);
    expect(screen.getByRole('checkbox', { name: 'Replies to my comments' })).not.toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'Forks of my setups' })).toBeChecked();
    fireEvent.press(screen.getByRole('checkbox', { name: 'Forks of my setups' }));
    expect(onChange).toHaveBeenCalledWith({ types: { 'setup-forked': false } });
    fireEvent.press(screen.getByRole('checkbox', { name: 'Replies to my comments' }));
    expect(onChange).toHaveBeenLastCalledWith({ types: { 'comment-reply': true } });
  });

  it('switches to one digest a day', () => {
    const onChange = jest.fn();
    renderThemed(<EmailPreferencesForm preferences={DEFAULT_EMAIL_PREFERENCES} emailConfirmed onChange={onChange} />);
    expect(screen.getByRole('radio', { name: 'One e-mail each time something happens' })).toBeChecked();
    fireEvent.press(screen.getByRole('radio', { name: 'One digest e-mail a day' }));
    expect(onChange).toHaveBeenCalledWith({ delivery: 'daily-digest' });
  });

  it('with everything off, says so and keeps the per-type choices out of reach until switched on again', () => {
    const onChange = jest.fn();
    renderThemed(<EmailPreferencesForm preferences={{ ...DEFAULT_EMAIL_PREFERENCES, enabled: false }} emailConfirmed onChange={onChange} />);
    expect(screen.getByText(/Notification e-mail is off/)).toBeTruthy();
    fireEvent.press(screen.getByRole('checkbox', { name: 'New followers' }));
    expect(onChange).not.toHaveBeenCalled();
    fireEvent(screen.getByLabelText('Send me notification e-mail'), 'valueChange', true);
    expect(onChange).toHaveBeenCalledWith({ enabled: true });
  });

  it('asks for a confirmed address first when the address is not confirmed', () => {
    renderThemed(<EmailPreferencesForm preferences={DEFAULT_EMAIL_PREFERENCES} emailConfirmed={false} onChange={() => {}} />);
    expect(screen.getByText(/Confirm your e-mail address first/)).toBeTruthy();
  });
});

describe('EmailPreferencesUnsubscribe (the page behind an e-mail link)', () => {
  const info = { scope: 'comment-on-setup' as const, label: 'Comments on my setups', handle: 'juno_braithwick', alreadyOff: false };

  it('says what the link stops and for whom, and stops it in one press', () => {
    const onConfirm = jest.fn();
    renderThemed(<EmailPreferencesUnsubscribe info={info} onConfirm={onConfirm} pending={false} doneMessage={null} error={null} />);
    expect(screen.getByRole('heading', { name: 'Stop e-mail about comments on my setups?' })).toBeTruthy();
    expect(screen.getByText(/@juno_braithwick/)).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Stop e-mail about comments on my setups' }));
    expect(onConfirm).toHaveBeenCalledTimes(1);
  });

  it('offers no button when those e-mails are already off, and shows the confirmation once done', () => {
    const { rerender } = renderThemed(
      <EmailPreferencesUnsubscribe info={{ ...info, alreadyOff: true }} onConfirm={() => {}} pending={false} doneMessage={null} error={null} />,
    );
    expect(screen.getByRole('heading', { name: 'Already stopped' })).toBeTruthy();
    expect(screen.queryByRole('button')).toBeNull();
    rerender(<EmailPreferencesUnsubscribe info={info} onConfirm={() => {}} pending={false} doneMessage="You will get no more e-mail about: comments on my setups." error={null} />);
    expect(screen.getByRole('status')).toHaveTextContent(/no more e-mail/);
    expect(screen.getByRole('link', { name: 'Open e-mail settings' })).toBeTruthy();
  });
});
