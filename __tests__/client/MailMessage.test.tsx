import { screen } from '@testing-library/react-native';
import { htmlToPlainText } from '../../components/HtmlContent';
import { MailMessage } from '../../components/MailMessage';
import { linksIn } from '../../hooks/mailbox';
import { renderThemed } from './support/render';

const text = [
  'Hello Maren,',
  'Confirm your address: http://127.0.0.1:8080/verify-email?token=abc123def456.',
  'Or reset (http://127.0.0.1:8080/reset-password?token=zzz999yyy888).',
  'Again: http://127.0.0.1:8080/verify-email?token=abc123def456',
].join('\n');

describe('linksIn', () => {
  it('finds each web address once, without the sentence punctuation around it', () => {
    expect(linksIn(text)).toEqual([
      'http://127.0.0.1:8080/verify-email?token=abc123def456',
      'http://127.0.0.1:8080/reset-password?token=zzz999yyy888',
    ]);
  });

  it('finds nothing in a mail without links', () => {
    expect(linksIn('Your setup was forked 3 times this week.')).toEqual([]);
  });
});

describe('MailMessage', () => {
  it('shows the subject, the text and every link as something to press', () => {
    renderThemed(
      <MailMessage
        message={{ id: 4, to: 'maren@example.test', subject: 'Confirm your address', text, html: '', receivedAt: '2025-06-01T10:00:00.000Z' }}
        links={linksIn(text)}
      />,
    );
    expect(screen.getByText('Confirm your address')).toBeTruthy();
    expect(screen.getByText(/Hello Maren,/)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Open http://127.0.0.1:8080/verify-email?token=abc123def456' })).toBeTruthy();
    expect(screen.getAllByRole('link')).toHaveLength(2);
  });
});

describe('htmlToPlainText (bio fallback off the web)', () => {
  it('keeps the words and paragraph breaks and drops the markup', () => {
    expect(htmlToPlainText('<p>Runs <strong>7.5k</strong> springs &amp; 500 cSt oil.</p><p>Ask me &lt;anything&gt;</p>')).toBe(
      'Runs 7.5k springs & 500 cSt oil.\nAsk me <anything>',
    );
  });
});
