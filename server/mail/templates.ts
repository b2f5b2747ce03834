export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

export interface InvitationMail {
  coachName: string;
  link: string;
  expiresAt: Date | string;
}

export interface CommentMail {
  /** the version owner's display name */
  ownerName: string;
  authorName: string;
  recipeTitle: string;
  versionNumber: number;
  /** the comment itself; long ones are cut in the mail */
  body: string;
  link: string;
}

export interface PasswordResetMail {
  displayName: string;
  link: string;
  expiresAt: Date | string;
}

const HTML_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => HTML_ESCAPES[ch]);
}

/** Names go into a subject line: no line breaks, no runs of spaces. */
function singleLine(value: string): string {
  return value.replace(/\s+/g, ' ').trim();
}

/** Only web links go into a mail; anything else (javascript:, data:) is a bug upstream. */
function checkedLink(link: string): string {
  let url: URL;
  try {
    url = new URL(link);
  } catch {
    throw new Error(`Mail link is not a URL: ${link}`);
  }
  if (url.protocol !== 'https:' && url.protocol !== 'http:') throw new Error(`Mail link must be http(s): ${link}`);
  // the URL parser quietly drops tabs and line breaks; a link with any would not survive the mail
  if (/\s/.test(link)) throw new Error('Mail link must not contain white space.');
  return link;
}

/** Expiry in UTC so the words do not depend on the server's time zone. */
export function formatExpiry(expiresAt: Date | string): string {
  const date = expiresAt instanceof Date ? expiresAt : new Date(expiresAt);
  if (Number.isNaN(date.getTime())) throw new Error(`Mail expiry is not a date: ${String(expiresAt)}`);
  const words = new Intl.DateTimeFormat('en-US', { dateStyle: 'long', timeStyle: 'short', timeZone: 'UTC' }).format(date);
  return `${words} UTC`;
}

const COMMENT_EXCERPT_CHARS = 600;

interface Layout {
  greeting: string;
  paragraphs: string[];
  buttonLabel: string;
  link: string;
  /** when the link stops working; left out for links that do not expire */
  expiry?: string;
  ignoreLine: string;
}

function renderText(layout: Layout): string {
  return [
    layout.greeting,
    '',
    ...layout.paragraphs.flatMap((p) => [p, '']),
    `${layout.buttonLabel}:`,
    layout.link,
    '',
    ...(layout.expiry ? [layout.expiry, ''] : []),
    layout.ignoreLine,
    '',
    '— Hearthswap',
    '',
  ].join('\n');
}

function renderHtml(layout: Layout): string {
  const href = escapeHtml(layout.link);
  const paragraph = (text: string) => `<p style="margin:0 0 16px">${escapeHtml(text)}</p>`;
  return [
    '<!doctype html>',
    '<html lang="en"><body style="margin:0;padding:24px;background:#fbf6ef;font-family:Nunito,Arial,sans-serif;color:#3b2f2a;line-height:1.5">',
    '<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:12px;padding:24px">',
    paragraph(layout.greeting),
    ...layout.paragraphs.map(paragraph),
    `<p style="margin:0 0 16px"><a href="${href}" style="display:inline-block;background:#c4532d;color:#ffffff;text-decoration:none;padding:10px 18px;border-radius:8px;font-weight:700">${escapeHtml(layout.buttonLabel)}</a></p>`,
    `<p style="margin:0 0 16px;font-size:14px">If the button does not work, paste this link into your browser:<br><a href="${href}">${href}</a></p>`,
    ...(layout.expiry ? [paragraph(layout.expiry)] : []),
    `<p style="margin:0 0 16px;font-size:14px;color:#6b5a52">${escapeHtml(layout.ignoreLine)}</p>`,
    '<p style="margin:0">— Hearthswap</p>',
    '</div></body></html>',
  ].join('\n');
}

function render(subject: string, layout: Layout): MailContent {
  return { subject, text: renderText(layout), html: renderHtml(layout) };
}

export const mailTemplates = {
  invitation({ coachName, link, expiresAt }: InvitationMail): MailContent {
    const coach = singleLine(coachName);
    return render(`${coach} invited you to Hearthswap`, {
      greeting: 'Hello,',
      paragraphs: [
        `${coach} would like to coach you on Hearthswap, where favourite comfort-food recipes get rewritten for more protein and fewer calories without shrinking the plate.`,
        `Once you accept, the swaps ${coach} approves come first in every rewrite, and the daily and per-meal targets they set for you become your starting point.`,
      ],
      buttonLabel: 'Accept the invitation',
      link: checkedLink(link),
      expiry: `This invitation is open until ${formatExpiry(expiresAt)}. After that, ask ${coach} for a fresh one.`,
      ignoreLine: 'Not expecting this? You can safely ignore this e-mail: nothing happens unless you open the link and accept.',
    });
  },

  newComment({ ownerName, authorName, recipeTitle, versionNumber, body, link }: CommentMail): MailContent {
    const author = singleLine(authorName);
    const title = singleLine(recipeTitle);
    const owner = singleLine(ownerName);
    const text = body.trim();
    const excerpt = text.length > COMMENT_EXCERPT_CHARS ? `${text.slice(0, COMMENT_EXCERPT_CHARS).trimEnd()}…` : text;
    return render(`${author} commented on ${title}`, {
      greeting: owner ? `Hello ${owner},` : 'Hello,',
      paragraphs: [`${author} left a comment on version ${versionNumber} of “${title}”:`, `“${excerpt}”`],
      buttonLabel: 'Read the comment',
      link: checkedLink(link),
      ignoreLine: 'You get this e-mail because your coach reviews the recipes you save. Leaving your coach on “My coach” stops these e-mails.',
    });
  },

  passwordReset({ displayName, link, expiresAt }: PasswordResetMail): MailContent {
    const name = singleLine(displayName);
    return render('Choose a new Hearthswap password', {
      greeting: name ? `Hello ${name},` : 'Hello,',
      paragraphs: ['Someone, hopefully you, asked to reset the password of your Hearthswap account.'],
      buttonLabel: 'Choose a new password',
      link: checkedLink(link),
      expiry: `The link works until ${formatExpiry(expiresAt)}.`,
      ignoreLine: 'If you did not ask for this, ignore this e-mail: your password stays as it is.',
    });
  },
};
