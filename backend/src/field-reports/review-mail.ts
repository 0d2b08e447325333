import type { MailMessage } from '../mail/mail.service';
import { escapeHtml } from '../mail/mail-html';

export interface DecisionMailInput {
  to: string;
  name: string;
  status: 'approved' | 'rejected';
  /** The report's one-line title. */
  title: string;
  /** The moderator's note (approval) or reason (rejection). */
  note: string | null;
  link: string;
}

/** Tells a contributor what became of their field report. */
export function decisionMail(m: DecisionMailInput): MailMessage {
  const approved = m.status === 'approved';
  const subject = approved ? `Your field report was approved: ${m.title}` : `Your field report was not accepted: ${m.title}`;
  const lead = approved
    ? 'A moderator approved your field report on the review desk, and the knowledge base now includes it. Thank you for sharing what fixed the fault.'
    : 'A moderator reviewed your field report and did not accept it.';
  const noteLabel = approved ? 'Note from the moderator' : 'Reason';
  const text = [
    `Hello ${m.name},`,
    '',
    lead,
    '',
    `Report: ${m.title}`,
    ...(m.note ? [`${noteLabel}: ${m.note}`] : []),
    '',
    `See the report: ${m.link}`,
    '',
    'Causeway',
  ].join('\n');
  const html = [
    `<p>Hello ${escapeHtml(m.name)},</p>`,
    `<p>${escapeHtml(lead)}</p>`,
    `<p><strong>Report:</strong> ${escapeHtml(m.title)}</p>`,
    ...(m.note ? [`<p><strong>${escapeHtml(noteLabel)}:</strong> ${escapeHtml(m.note)}</p>`] : []),
    `<p><a href="${escapeHtml(m.link)}">See the report</a></p>`,
    '<p>Causeway</p>',
  ].join('\n');
  return { to: m.to, subject, text, html };
}
