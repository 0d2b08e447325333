import { formatMoney, formatPercent, type EstimateStageDto, type EstimateTotals } from '@causeway/shared';
import type { MailMessage } from '../mail/mail.service';
import { escapeHtml } from '../mail/mail-html';

export interface EstimateMailInput {
  to: string;
  shopName: string;
  vehicle: { make: string; model: string; year: number | null; plate: string | null };
  complaint: string;
  codes: Array<{ code: string; title: string | null }>;
  message: string | null;
  stages: EstimateStageDto[];
  totals: EstimateTotals;
  currency: string;
  locale: string;
  taxRateBp: number;
  link: string;
  expiresAt: Date;
}

function vehicleName(v: EstimateMailInput['vehicle']): string {
  return [v.year, v.make, v.model].filter((x) => x !== null && x !== '').join(' ') + (v.plate ? ` (${v.plate})` : '');
}

/** The staged estimate as an e-mail: plain text and simple HTML, with the link to approve or decline each stage. */
export function estimateMail(m: EstimateMailInput): MailMessage {
  const money = (minor: number) => formatMoney(minor, m.currency, m.locale);
  const pct = (p: number) => formatPercent(p, m.locale);
  const taxPct = formatPercent(m.taxRateBp / 10_000, m.locale);
  const until = m.expiresAt.toLocaleDateString(m.locale, { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });
  const car = vehicleName(m.vehicle);
  const subject = `Staged estimate from ${m.shopName} for your ${car}`;
  const codes = m.codes.map((c) => `${c.code}${c.title ? ` – ${c.title}` : ''}`);

  const textStages = m.stages.map((s) => {
    const upTo = s.priceUpTo ? ` (at most ${money(s.priceUpTo.gross)})` : '';
    return [
      `Stage ${s.index + 1} (${s.code}): ${s.title}`,
      `  Price: ${money(s.price.gross)} including ${money(s.price.tax)} tax (${money(s.price.net)} before tax)${upTo}`,
      `  Chance it fixes the fault: ${pct(s.fixProbabilityIfReached)} if reached; ${pct(s.cumulativeFixProbability)} fixed by the end of this stage`,
      `  If it does not: ${s.ifNotFixed}`,
      ...(s.cautions.length ? [`  Safety: ${s.cautions.map((c) => c.title).join('; ')}`] : []),
    ].join('\n');
  });
  const text = [
    `Hello,`,
    '',
    `${m.shopName} has prepared a staged estimate for your ${car}.`,
    `What you reported: ${m.complaint}`,
    `Fault codes: ${codes.join('; ')}`,
    ...(m.message ? ['', m.message] : []),
    '',
    'Each stage is done only if the ones before it did not fix the fault. Prices include tax at ' + taxPct + '.',
    '',
    ...textStages.flatMap((t) => [t, '']),
    `Expected cost: ${money(m.totals.expected.gross)} including tax. Every stage carried out: ${money(m.totals.allStages.gross)} including tax.`,
    '',
    `Read the estimate and approve or decline each stage here (the link works until ${until}):`,
    m.link,
    '',
    "All work follows the vehicle maker's procedure, local regulations and licensed practice.",
    `${m.shopName}`,
  ].join('\n');

  const rows = m.stages
    .map(
      (s) => `<tr>
<td style="padding:6px;border-top:1px solid #ccc;vertical-align:top">${s.index + 1}</td>
<td style="padding:6px;border-top:1px solid #ccc;vertical-align:top"><strong>${escapeHtml(s.title)}</strong> <small>(${escapeHtml(s.code)})</small><br><small>If it does not fix the fault: ${escapeHtml(s.ifNotFixed)}</small>${
        s.cautions.length ? `<br><small style="color:#7a4b00">Safety: ${escapeHtml(s.cautions.map((c) => c.title).join('; '))}</small>` : ''
      }</td>
<td style="padding:6px;border-top:1px solid #ccc;vertical-align:top;text-align:right">${escapeHtml(money(s.price.net))}</td>
<td style="padding:6px;border-top:1px solid #ccc;vertical-align:top;text-align:right">${escapeHtml(money(s.price.gross))}${s.priceUpTo ? `<br><small>at most ${escapeHtml(money(s.priceUpTo.gross))}</small>` : ''}</td>
<td style="padding:6px;border-top:1px solid #ccc;vertical-align:top;text-align:right">${escapeHtml(pct(s.fixProbabilityIfReached))}<br><small>${escapeHtml(pct(s.cumulativeFixProbability))} by now</small></td>
</tr>`,
    )
    .join('\n');
  const html = `<!doctype html>
<html lang="${escapeHtml(m.locale)}"><body style="font-family:'Source Sans 3',Arial,sans-serif;line-height:1.6;color:#1f2a2e">
<p>Hello,</p>
<p>${escapeHtml(m.shopName)} has prepared a staged estimate for your ${escapeHtml(car)}.</p>
<p>What you reported: ${escapeHtml(m.complaint)}<br>Fault codes: ${escapeHtml(codes.join('; '))}</p>
${m.message ? `<p>${escapeHtml(m.message)}</p>` : ''}
<p>Each stage is done only if the ones before it did not fix the fault. Prices include tax at ${escapeHtml(taxPct)}.</p>
<table style="border-collapse:collapse">
<thead><tr><th style="padding:6px;text-align:left">Stage</th><th style="padding:6px;text-align:left">Work</th><th style="padding:6px;text-align:right">Before tax</th><th style="padding:6px;text-align:right">With tax</th><th style="padding:6px;text-align:right">Chance it fixes it</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>
<p>Expected cost: <strong>${escapeHtml(money(m.totals.expected.gross))}</strong> including tax. Every stage carried out: ${escapeHtml(money(m.totals.allStages.gross))} including tax.</p>
<p><a href="${escapeHtml(m.link)}" style="background:#0b5f66;color:#fff;padding:10px 16px;text-decoration:none;border-radius:4px">Read the estimate and answer each stage</a></p>
<p><small>The link works until ${escapeHtml(until)}. If the button does not work, copy this address: ${escapeHtml(m.link)}</small></p>
<p><small>All work follows the vehicle maker's procedure, local regulations and licensed practice.</small></p>
<p>${escapeHtml(m.shopName)}</p>
</body></html>`;
  return { to: m.to, subject, text, html };
}
