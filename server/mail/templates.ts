/**
 * The product's own e-mail templates: each message has a plain-text and an HTML part. Every
 * interpolated value is escaped for HTML, and values that reach the Subject header go through
 * headerText (no line breaks).
 */
import { headerText } from "./headers";

export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[ch]!);
}

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });
const dateTimeFormat = new Intl.DateTimeFormat("en-GB", {
  day: "numeric",
  month: "long",
  year: "numeric",
  hour: "2-digit",
  minute: "2-digit",
  timeZone: "UTC",
  timeZoneName: "short",
});

/** The shared HTML frame: bone page, soot header band, ember button. Inline styles only (mail clients). */
function frame(title: string, bodyHtml: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(title)}</title></head>
<body style="margin:0;padding:0;background:#f6f1e8;color:#1a1714;font-family:Inter,Segoe UI,Helvetica,Arial,sans-serif;">
<table role="presentation" width="100%" cellspacing="0" cellpadding="0" style="background:#f6f1e8;padding:24px 0;"><tr><td align="center">
<table role="presentation" width="560" cellspacing="0" cellpadding="0" style="max-width:560px;width:100%;background:#fcfaf6;border:1px solid #d8ccb8;border-radius:10px;overflow:hidden;">
<tr><td style="background:#26221e;color:#fcfaf6;padding:18px 24px;font-family:Georgia,serif;font-size:20px;font-weight:bold;">Grain <span style="color:#ff8c42;">&amp;</span> Edge</td></tr>
<tr><td style="height:4px;background:linear-gradient(90deg,#e3c26b,#c08a45,#7d4f8f,#3e5fa6);"></td></tr>
<tr><td style="padding:24px;font-size:16px;line-height:1.55;">${bodyHtml}</td></tr>
<tr><td style="padding:16px 24px;border-top:1px solid #ebe3d5;font-size:12px;color:#524a43;">Grain &amp; Edge — lessons on the physical metallurgy of blade steels.</td></tr>
</table></td></tr></table></body></html>`;
}

function button(href: string, label: string): string {
  return `<p style="margin:24px 0;"><a href="${escapeHtml(href)}" style="display:inline-block;background:#f26d1d;color:#0f0d0b;font-weight:bold;text-decoration:none;padding:12px 20px;border-radius:6px;">${escapeHtml(label)}</a></p>`;
}

export interface InvitationMailInput {
  recipientName: string | null;
  cohortName: string;
  instructorName: string;
  link: string;
  expiresAt: Date;
}

export function invitationMail(input: InvitationMailInput): MailContent {
  const cohort = headerText(input.cohortName, 120);
  const greeting = input.recipientName ? `Hello ${headerText(input.recipientName, 120)},` : "Hello,";
  const expires = dateTimeFormat.format(input.expiresAt);
  const subject = headerText(`You are invited to ${cohort} on Grain & Edge`);
  const text = [
    greeting,
    "",
    `${headerText(input.instructorName, 120)} has invited you to join the cohort "${cohort}" on Grain & Edge, a course on the physical metallurgy of blade steels.`,
    "",
    "Choose your name and a password here to join:",
    input.link,
    "",
    `The link works once and expires on ${expires}.`,
    "If you did not expect this e-mail, you can ignore it: nothing happens unless the link is used.",
    "",
    "— Grain & Edge",
    "",
  ].join("\n");
  const html = frame(
    subject,
    `<p>${escapeHtml(greeting)}</p>
<p><strong>${escapeHtml(headerText(input.instructorName, 120))}</strong> has invited you to join the cohort <strong>${escapeHtml(cohort)}</strong> on Grain &amp; Edge, a course on the physical metallurgy of blade steels.</p>
${button(input.link, "Join the cohort")}
<p style="font-size:14px;color:#38322c;">Or paste this link into your browser:<br><span style="word-break:break-all;font-family:monospace;">${escapeHtml(input.link)}</span></p>
<p style="font-size:14px;color:#38322c;">The link works once and expires on ${escapeHtml(expires)}. If you did not expect this e-mail, you can ignore it: nothing happens unless the link is used.</p>`,
  );
  return { subject, text, html };
}

export interface ReminderMailInput {
  recipientName: string;
  cohortName: string;
  moduleTitle: string;
  dueAt: Date;
  lessonsDone: number;
  lessonsTotal: number;
  quizzesPassed: number;
  quizzesTotal: number;
  link: string;
}

export function reminderMail(input: ReminderMailInput): MailContent {
  const due = dateFormat.format(input.dueAt);
  const module = headerText(input.moduleTitle, 160);
  const cohort = headerText(input.cohortName, 120);
  const subject = headerText(`Due ${due}: ${module} (${cohort})`);
  const progress = `${input.lessonsDone} of ${input.lessonsTotal} lessons completed, ${input.quizzesPassed} of ${input.quizzesTotal} quizzes passed`;
  const text = [
    `Hello ${headerText(input.recipientName, 120)},`,
    "",
    `"${module}" is due on ${due} for the cohort "${cohort}".`,
    `So far: ${progress}.`,
    "",
    "Pick up where you left off:",
    input.link,
    "",
    "— Grain & Edge",
    "",
  ].join("\n");
  const html = frame(
    subject,
    `<p>Hello ${escapeHtml(headerText(input.recipientName, 120))},</p>
<p><strong>${escapeHtml(module)}</strong> is due on <strong>${escapeHtml(due)}</strong> for the cohort ${escapeHtml(cohort)}.</p>
<p>So far: ${escapeHtml(progress)}.</p>
${button(input.link, "Continue learning")}`,
  );
  return { subject, text, html };
}
