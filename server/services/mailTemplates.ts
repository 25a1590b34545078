import type { OutgoingMail } from './mail';

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/** Our one mail layout: a heading, a paragraph, a button-like link and the link in clear. */
function layout(to: string, subject: string, greeting: string, body: string, action: { label: string; url: string }, footer: string): OutgoingMail {
  const text = `${greeting}\n\n${body}\n\n${action.label}: ${action.url}\n\n${footer}\n\n— Tunefork`;
  const html = `<!doctype html><html><body style="font-family:Arial,sans-serif;color:#1C1F22;background:#F4F2EE;padding:24px">
<div style="max-width:520px;margin:0 auto;background:#FFFFFF;border:1px solid #D9D5CE;border-radius:10px;padding:24px">
<p style="font-size:18px;font-weight:bold;margin:0 0 12px">Tunefork</p>
<p>${escapeHtml(greeting)}</p>
<p>${escapeHtml(body)}</p>
<p><a href="${escapeHtml(action.url)}" style="display:inline-block;background:#0B6A66;color:#FFFFFF;padding:10px 18px;border-radius:999px;text-decoration:none">${escapeHtml(action.label)}</a></p>
<p style="font-size:13px;color:#545A61">Or open this address: ${escapeHtml(action.url)}</p>
<p style="font-size:13px;color:#545A61">${escapeHtml(footer)}</p>
</div></body></html>`;
  return { to, subject, text, html };
}

export function verificationMail(to: string, displayName: string, url: string): OutgoingMail {
  return layout(
    to,
    'Confirm your e-mail address for Tunefork',
    `Hello ${displayName},`,
    'Confirm this address so you can publish setups and get notified when racers fork or comment on them. The link works for 48 hours.',
    { label: 'Confirm my address', url },
    'If you did not create a Tunefork account, ignore this message.',
  );
}

export function passwordResetMail(to: string, displayName: string, url: string): OutgoingMail {
  return layout(
    to,
    'Choose a new Tunefork password',
    `Hello ${displayName},`,
    'Someone asked to reset the password of your Tunefork account. The link works once, for one hour; choosing a new password signs out your other sessions.',
    { label: 'Choose a new password', url },
    'If you did not ask for this, ignore this message: your password stays as it is.',
  );
}

/** Where a notification mail's footer links: stop this kind of mail, stop all, or open settings. */
export type UnsubscribeLinks = { thisKind?: { label: string; url: string }; all: string; settings: string };

function unsubscribeFooter(links: UnsubscribeLinks): { text: string; html: string } {
  const parts = [
    ...(links.thisKind ? [{ label: `Stop e-mails about ${links.thisKind.label.toLowerCase()}`, url: links.thisKind.url }] : []),
    { label: 'Stop all notification e-mails', url: links.all },
    { label: 'E-mail settings', url: links.settings },
  ];
  return {
    text: parts.map((p) => `${p.label}: ${p.url}`).join('\n'),
    html: parts
      .map((p) => `<a href="${escapeHtml(p.url)}" style="color:#545A61">${escapeHtml(p.label)}</a>`)
      .join(' · '),
  };
}

/** Notification mail: lines of text (plain, escaped here), one action, the unsubscribe footer. */
function notificationLayout(
  to: string,
  subject: string,
  greeting: string,
  lines: string[],
  action: { label: string; url: string },
  links: UnsubscribeLinks,
  why: string,
): OutgoingMail {
  const footer = unsubscribeFooter(links);
  const text = `${greeting}\n\n${lines.join('\n')}\n\n${action.label}: ${action.url}\n\n${why}\n${footer.text}\n\n— Tunefork`;
  const html = `<!doctype html><html><body style="font-family:Arial,sans-serif;color:#1C1F22;background:#F4F2EE;padding:24px">
<div style="max-width:520px;margin:0 auto;background:#FFFFFF;border:1px solid #D9D5CE;border-radius:10px;padding:24px">
<p style="font-size:18px;font-weight:bold;margin:0 0 12px">Tunefork</p>
<p>${escapeHtml(greeting)}</p>
${lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('\n')}
<p><a href="${escapeHtml(action.url)}" style="display:inline-block;background:#0B6A66;color:#FFFFFF;padding:10px 18px;border-radius:999px;text-decoration:none">${escapeHtml(action.label)}</a></p>
<p style="font-size:13px;color:#545A61">${escapeHtml(why)}</p>
<p style="font-size:13px;color:#545A61">${footer.html}</p>
</div></body></html>`;
  return { to, subject, text, html };
}

/** One event's mail; `lines` say what happened, `link` where to see it. */
export function notificationMail(
  to: string,
  displayName: string,
  content: { subject: string; lines: string[]; link: { label: string; url: string } },
  links: UnsubscribeLinks,
): OutgoingMail {
  return notificationLayout(
    to,
    content.subject,
    `Hello ${displayName},`,
    content.lines,
    content.link,
    links,
    'You get this because your Tunefork e-mail settings ask for it.',
  );
}

/** The daily digest: one line per event, each with its address, newest last. */
export function digestMail(
  to: string,
  displayName: string,
  items: Array<{ text: string; url: string }>,
  home: string,
  links: UnsubscribeLinks,
): OutgoingMail {
  const count = items.length === 1 ? '1 thing' : `${items.length} things`;
  return notificationLayout(
    to,
    `Your Tunefork day: ${count} happened`,
    `Hello ${displayName},`,
    [`Here is what happened around your setups since the last digest:`, ...items.map((i) => `• ${i.text} — ${i.url}`)],
    { label: 'Open Tunefork', url: home },
    links,
    'You get one digest a day because your Tunefork e-mail settings ask for it.',
  );
}
