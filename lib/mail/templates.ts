/**
 * The team mails, each as a plain-text part complete on its own and a simple HTML part: inline styles, no images,
 * no remote content, no tracking of any kind. Every value put into the HTML is escaped.
 */
import { ROLE_LABELS, type Role } from '@/lib/auth/permissions';

export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

const dateTime = (d: Date) => d.toLocaleString('en-GB', { dateStyle: 'long', timeStyle: 'short', timeZone: 'UTC' }) + ' UTC';

/** The frame every mail's HTML part sits in: the shop's name above, a white card, who sent it below. */
export function mailFrame(shopName: string, bodyHtml: string, maxWidth = 560): string {
  return `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(shopName)}</title></head>
<body style="margin:0;padding:0;background:#f4f1ea">
<div style="max-width:${maxWidth}px;margin:0 auto;padding:24px 16px;font-family:-apple-system,'Segoe UI',Helvetica,Arial,sans-serif">
<div style="background:#ffffff;border:1px solid #e2ddd2;border-radius:8px;padding:24px">
<p style="margin:0 0 20px;font-size:13px;letter-spacing:.04em;text-transform:uppercase;color:#7a766c">${escapeHtml(shopName)}</p>
${bodyHtml}
</div>
<p style="margin:16px 0 0;font-size:12px;color:#7a766c;text-align:center">Sent by Kerfwise for ${escapeHtml(shopName)}.</p>
</div>
</body>
</html>`;
}

function layout(shopName: string, paragraphs: string[], button: { label: string; href: string } | null, after: string[]): string {
  const p = (html: string) => `<p style="margin:0 0 16px;font-size:15px;line-height:1.5;color:#2b2a27">${html}</p>`;
  return mailFrame(
    shopName,
    `${paragraphs.map(p).join('\n')}
${
  button
    ? `<p style="margin:24px 0"><a href="${escapeHtml(button.href)}" style="display:inline-block;background:#2b2a27;color:#ffffff;text-decoration:none;padding:12px 20px;border-radius:6px;font-size:15px;font-weight:600">${escapeHtml(button.label)}</a></p>
<p style="margin:0 0 16px;font-size:13px;line-height:1.5;color:#7a766c">If the button does not work, copy this address into your browser:<br><span style="word-break:break-all;color:#2b2a27">${escapeHtml(button.href)}</span></p>
`
    : ''
}${after.map((a) => `<p style="margin:0 0 12px;font-size:13px;line-height:1.5;color:#7a766c">${a}</p>`).join('\n')}`,
  );
}

export function inviteMail(input: {
  shopName: string;
  inviterName: string;
  personName: string;
  role: Role;
  link: string;
  expiresAt: Date;
}): RenderedMail {
  const role = ROLE_LABELS[input.role].toLowerCase();
  const article = /^[aeiou]/.test(role) ? 'an' : 'a';
  const subject = `${input.inviterName} invited you to ${input.shopName} on Kerfwise`;
  const text = [
    `Hello ${input.personName},`,
    '',
    `${input.inviterName} has added you to ${input.shopName} on Kerfwise as ${article} ${role}.`,
    'Open this link to choose your password and sign in:',
    '',
    input.link,
    '',
    `The link works once and until ${dateTime(input.expiresAt)}. If it has expired, ask ${input.inviterName} to send a new invite.`,
    'If you were not expecting this, you can ignore this mail: nothing happens until the link is used.',
    '',
    `— Kerfwise, for ${input.shopName}`,
    '',
  ].join('\n');
  const html = layout(
    input.shopName,
    [
      `Hello ${escapeHtml(input.personName)},`,
      `${escapeHtml(input.inviterName)} has added you to <strong>${escapeHtml(input.shopName)}</strong> on Kerfwise as ${article} ${escapeHtml(role)}. Choose your password to sign in.`,
    ],
    { label: 'Choose your password', href: input.link },
    [
      `The link works once and until ${escapeHtml(dateTime(input.expiresAt))}. If it has expired, ask ${escapeHtml(input.inviterName)} to send a new invite.`,
      'If you were not expecting this, you can ignore this mail: nothing happens until the link is used.',
    ],
  );
  return { subject, text, html };
}

export function passwordResetMail(input: { shopName: string; personName: string; link: string; expiresAt: Date }): RenderedMail {
  const subject = `Reset your Kerfwise password for ${input.shopName}`;
  const text = [
    `Hello ${input.personName},`,
    '',
    'Someone — hopefully you — asked to reset your Kerfwise password. Open this link to choose a new one:',
    '',
    input.link,
    '',
    `The link works once and until ${dateTime(input.expiresAt)}. Your current password keeps working until you choose a new one.`,
    'If you did not ask for this, ignore this mail: your password stays as it is.',
    '',
    `— Kerfwise, for ${input.shopName}`,
    '',
  ].join('\n');
  const html = layout(
    input.shopName,
    [`Hello ${escapeHtml(input.personName)},`, 'Someone — hopefully you — asked to reset your Kerfwise password. Choose a new one here:'],
    { label: 'Choose a new password', href: input.link },
    [
      `The link works once and until ${escapeHtml(dateTime(input.expiresAt))}. Your current password keeps working until you choose a new one.`,
      'If you did not ask for this, ignore this mail: your password stays as it is.',
    ],
  );
  return { subject, text, html };
}

/**
 * A customer's mail said once and rendered twice: a paragraph is a list of runs, plain text or `{ strong }`; the
 * plain-text part prints them as they are (with the link on a line of its own), the HTML part escapes them.
 */
type Run = string | { strong: string };
interface CustomerMail {
  shopName: string;
  subject: string;
  paragraphs: Run[][];
  button: { label: string; href: string; lead: string } | null;
  after: string[];
}

function renderCustomerMail(m: CustomerMail): RenderedMail {
  const plain = (p: Run[]) => p.map((r) => (typeof r === 'string' ? r : r.strong)).join('');
  const html = (p: Run[]) => p.map((r) => (typeof r === 'string' ? escapeHtml(r) : `<strong>${escapeHtml(r.strong)}</strong>`)).join('');
  const [greeting, ...body] = m.paragraphs;
  const blocks = [
    [plain(greeting)],
    ...body.map((p) => [plain(p)]),
    ...(m.button ? [[m.button.lead, '', m.button.href]] : []),
    ...m.after.map((a) => [a]),
    [`— ${m.shopName}`],
  ];
  const text = `${blocks.map((b) => b.join('\n')).join('\n\n')}\n`;
  return { subject: m.subject, text, html: layout(m.shopName, m.paragraphs.map(html), m.button, m.after.map(escapeHtml)) };
}

/** What the customer's mails say about the quote (prices only: never cost, margin or hours). */
export interface QuoteMailFacts {
  shopName: string;
  customerName: string;
  /** Q-0007 rev B */
  title: string;
  jobName: string;
  total: string;
  deposit: string;
  /** The deposit asked for is zero. */
  noDeposit: boolean;
  validUntil: string;
  link: string;
}

export function quoteMail(q: QuoteMailFacts & { replaces: string | null }): RenderedMail {
  const deposit = q.noDeposit ? 'No deposit is asked for.' : `A deposit of ${q.deposit} is paid online once you accept.`;
  return renderCustomerMail({
    shopName: q.shopName,
    subject: `${q.shopName}: your quote ${q.title} for ${q.jobName}`,
    paragraphs: [
      [`Hello ${q.customerName},`],
      ['Here is your quote ', { strong: q.title }, ` from ${q.shopName} for ${q.jobName}: `, { strong: q.total }, ' in all. The PDF is attached.'],
      ...(q.replaces ? [[`This quote replaces ${q.replaces}; its link no longer works.`]] : []),
      [`${deposit} The quote holds until ${q.validUntil}.`],
    ],
    button: { label: 'Read and answer the quote', href: q.link, lead: 'Read it, then accept or decline it on its page:' },
    after: ['Questions? Reply to the shop directly: this address is not read.'],
  });
}

export function quoteAcceptedMail(q: QuoteMailFacts & { acceptedName: string; acceptedAt: string }): RenderedMail {
  const next = q.noDeposit
    ? 'No deposit is needed: the shop will be in touch about the next steps.'
    : `The next step is the deposit of ${q.deposit}, paid online on the quote's page.`;
  return renderCustomerMail({
    shopName: q.shopName,
    subject: `${q.shopName}: you accepted quote ${q.title}`,
    paragraphs: [
      [`Hello ${q.customerName},`],
      ['Thank you: quote ', { strong: q.title }, ` for ${q.jobName} (${q.total}) was accepted by ${q.acceptedName} on ${q.acceptedAt}.`],
      [next],
    ],
    button: { label: q.noDeposit ? 'See the quote' : 'Pay the deposit', href: q.link, lead: q.noDeposit ? 'The quote:' : 'Pay it here:' },
    after: [],
  });
}

export function depositReceiptMail(
  q: Omit<QuoteMailFacts, 'link' | 'validUntil'> & { paid: string; paidAt: string; balance: string; reference: string },
): RenderedMail {
  return renderCustomerMail({
    shopName: q.shopName,
    subject: `${q.shopName}: deposit received for ${q.title}`,
    paragraphs: [
      [`Hello ${q.customerName},`],
      ['We received your deposit of ', { strong: q.paid }, ` for quote ${q.title} (${q.jobName}) on ${q.paidAt}. Thank you.`],
      [`Quote total ${q.total}; balance still to pay ${q.balance}.`],
      [`Payment reference: ${q.reference}`],
    ],
    button: null,
    after: ['Keep this mail as your receipt.'],
  });
}
