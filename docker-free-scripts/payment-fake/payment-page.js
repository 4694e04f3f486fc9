// @ts-check
/**
 * The local payment page: plain server-rendered HTML of our own design. Every interpolated
 * value goes through `escapeHtml` — line item names and URLs come from users.
 */
import { formatMinorUnits } from './money.js';
import { TEST_CARDS, groupCardNumber } from './test-cards.js';

export const PAGE_TITLE = 'Local test payment — no real money moves';

/** @type {Record<string, string>} */
const ENTITIES = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
  '`': '&#96;',
};

/**
 * @param {unknown} value
 * @returns {string}
 */
export function escapeHtml(value) {
  return String(value ?? '').replace(/[&<>"'`]/g, (ch) => ENTITIES[ch] ?? ch);
}

const STYLE = `
:root { color-scheme: light; }
* { box-sizing: border-box; }
body { margin: 0; background: #FBF6EE; color: #2B1E2F;
  font: 16px/1.55 system-ui, -apple-system, 'Segoe UI', Roboto, 'Helvetica Neue', Arial, sans-serif; }
main { max-width: 40rem; margin: 0 auto; padding: 2rem 1.25rem 3rem; }
h1, h2 { font-family: 'Playfair Display', Georgia, 'Times New Roman', serif; font-weight: 700;
  line-height: 1.2; margin: 0 0 .75rem; }
h1 { font-size: 1.9rem; }
h2 { font-size: 1.3rem; margin-top: 2rem; }
p { margin: 0 0 1rem; }
.lede { font-size: 1.05rem; }
.panel { background: #fff; border: 1px solid rgba(43, 30, 47, .18); border-radius: .75rem;
  padding: 1.25rem; margin: 1.25rem 0; }
table { width: 100%; border-collapse: collapse; }
th, td { text-align: left; padding: .5rem .25rem; border-bottom: 1px solid rgba(43, 30, 47, .14);
  vertical-align: top; }
th { font-weight: 600; font-size: .9rem; }
.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
tfoot td { font-weight: 700; border-bottom: 0; font-size: 1.1rem; }
label { display: block; font-weight: 600; margin: 1rem 0 .3rem; }
.hint { font-size: .9rem; margin: .25rem 0 0; }
input { width: 100%; font: inherit; padding: .65rem .75rem; border: 1px solid #2B1E2F;
  border-radius: .45rem; background: #fff; color: #2B1E2F; }
input[readonly] { background: #F3ECE1; }
input:focus-visible, button:focus-visible, a:focus-visible { outline: 3px solid #C2813A;
  outline-offset: 2px; }
.actions { display: flex; flex-wrap: wrap; gap: .75rem 1.25rem; align-items: center;
  margin-top: 1.5rem; }
button { font: inherit; font-weight: 600; border: 0; border-radius: .45rem; padding: .8rem 1.3rem;
  background: #2B1E2F; color: #FBF6EE; cursor: pointer; }
button.secondary { background: #fff; color: #2B1E2F; border: 1px solid #2B1E2F; }
a { color: #2B1E2F; }
.alert { border: 1px solid #A3324A; border-left-width: 6px; background: #fff; border-radius: .45rem;
  padding: .75rem 1rem; margin: 1rem 0; }
.alert strong { display: block; }
.cards td:first-child { font-family: ui-monospace, 'SFMono-Regular', Menlo, Consolas, monospace;
  white-space: nowrap; }
.small { font-size: .9rem; }
`;

/**
 * @param {{ heading?: string, body: string, lang?: string }} parts
 * @returns {string}
 */
function layout({ heading = PAGE_TITLE, body, lang = 'en' }) {
  return `<!doctype html>
<html lang="${escapeHtml(lang)}">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(PAGE_TITLE)}</title>
<style>${STYLE}</style>
</head>
<body>
<main>
<h1>${escapeHtml(heading)}</h1>
<p class="lede">This page stands in for the card payment service while the app runs on this
machine. Nothing is charged and no card details leave this computer.</p>
${body}
</main>
</body>
</html>
`;
}

/**
 * @typedef {object} PageLineItem
 * @property {string} name
 * @property {number} quantity
 * @property {number} unitAmount integer minor units
 * @property {number} amountTotal integer minor units
 */

/**
 * @typedef {object} PageSession
 * @property {string} id
 * @property {string} currency
 * @property {number} amountTotal
 * @property {string | null} customerEmail e-mail fixed by the shop, if any
 * @property {string | null} cancelUrl
 * @property {string | null} successUrl
 * @property {number} expiresAt unix seconds
 * @property {string} locale a BCP 47 tag for number and date formats
 * @property {PageLineItem[]} lineItems
 */

/**
 * @param {PageSession} session
 * @returns {string}
 */
function orderSummary(session) {
  const money = (/** @type {number} */ amount) =>
    escapeHtml(formatMinorUnits(amount, session.currency, session.locale));
  const rows = session.lineItems
    .map(
      (item) => `<tr>
<td>${escapeHtml(item.name)}</td>
<td class="num">${escapeHtml(item.quantity)}</td>
<td class="num">${money(item.unitAmount)}</td>
<td class="num">${money(item.amountTotal)}</td>
</tr>`,
    )
    .join('\n');
  return `<section class="panel" aria-labelledby="order-heading">
<h2 id="order-heading" style="margin-top:0">Your order</h2>
<table>
<thead><tr><th scope="col">Item</th><th scope="col" class="num">Qty</th><th scope="col" class="num">Each</th><th scope="col" class="num">Amount</th></tr></thead>
<tbody>
${rows}
</tbody>
<tfoot><tr><td colspan="3">Total to pay</td><td class="num" data-testid="total">${money(session.amountTotal)}</td></tr></tfoot>
</table>
</section>`;
}

/** @returns {string} */
function testCardList() {
  const rows = TEST_CARDS.map(
    (card) =>
      `<tr><td>${escapeHtml(groupCardNumber(card.number))}</td><td>${escapeHtml(card.label)}</td></tr>`,
  ).join('\n');
  return `<section aria-labelledby="cards-heading">
<h2 id="cards-heading">Test cards</h2>
<p class="small">Use any of these numbers. Other numbers are refused, because this page only
takes test cards.</p>
<table class="cards">
<thead><tr><th scope="col">Card number</th><th scope="col">What happens</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>
</section>`;
}

/**
 * @param {string} locale
 * @param {number} unixSeconds
 * @returns {string}
 */
function formatTime(locale, unixSeconds) {
  return new Intl.DateTimeFormat(locale, {
    dateStyle: 'medium',
    timeStyle: 'short',
    timeZone: 'UTC',
  }).format(new Date(unixSeconds * 1000));
}

/**
 * @param {string | null} cancelUrl
 * @returns {string}
 */
function cancelLink(cancelUrl) {
  return cancelUrl ? `<a href="${escapeHtml(cancelUrl)}">Cancel and return</a>` : '';
}

/**
 * @param {{ title: string, detail: string } | null | undefined} error
 * @returns {string}
 */
function alertBox(error) {
  if (!error) return '';
  return `<div class="alert" role="alert"><strong>${escapeHtml(error.title)}</strong>${escapeHtml(error.detail)}</div>`;
}

/**
 * The card form for an open session.
 * @param {{ session: PageSession, email?: string, cardNumber?: string,
 *   error?: { title: string, detail: string } | null }} input
 * @returns {string}
 */
export function renderCheckoutPage({ session, email = '', cardNumber = '', error = null }) {
  const fixedEmail = session.customerEmail;
  const emailValue = fixedEmail ?? email;
  const body = `${alertBox(error)}
${orderSummary(session)}
<form method="post" action="/pay/${encodeURIComponent(session.id)}" novalidate>
<label for="email">E-mail for the receipt</label>
<input id="email" name="email" type="email" autocomplete="email" required value="${escapeHtml(emailValue)}"${fixedEmail ? ' readonly' : ''}>
<label for="card_number">Card number</label>
<input id="card_number" name="card_number" type="text" inputmode="numeric" autocomplete="cc-number" required value="${escapeHtml(cardNumber)}" aria-describedby="card-hint">
<p class="hint" id="card-hint">A test card from the list below, e.g. 4242 4242 4242 4242.</p>
<div class="actions">
<button type="submit">Pay ${escapeHtml(formatMinorUnits(session.amountTotal, session.currency, session.locale))}</button>
${cancelLink(session.cancelUrl)}
</div>
</form>
<p class="small">This payment page stays open until ${escapeHtml(formatTime(session.locale, session.expiresAt))} (UTC).</p>
${testCardList()}`;
  return layout({ body, lang: session.locale });
}

/**
 * The bank's authentication step for the card that asks for it.
 * @param {{ session: PageSession, email: string }} input
 * @returns {string}
 */
export function renderAuthenticationPage({ session, email }) {
  const action = `/pay/${encodeURIComponent(session.id)}/authenticate`;
  const body = `<section class="panel" aria-labelledby="auth-heading">
<h2 id="auth-heading" style="margin-top:0">Your bank asks you to confirm this payment</h2>
<p>This stands in for the bank's own check (3D Secure). Choose what the bank answers.</p>
<p>Amount: <strong>${escapeHtml(formatMinorUnits(session.amountTotal, session.currency, session.locale))}</strong><br>
Receipt to: ${escapeHtml(email)}</p>
<form method="post" action="${escapeHtml(action)}">
<div class="actions">
<button type="submit" name="outcome" value="complete">Complete authentication</button>
<button type="submit" name="outcome" value="fail" class="secondary">Fail authentication</button>
</div>
</form>
</section>
${cancelLink(session.cancelUrl)}`;
  return layout({ body, lang: session.locale });
}

/**
 * A session that can no longer be paid.
 * @param {{ session: PageSession, status: 'complete' | 'expired' }} input
 * @returns {string}
 */
export function renderClosedPage({ session, status }) {
  const total = escapeHtml(formatMinorUnits(session.amountTotal, session.currency, session.locale));
  const body =
    status === 'complete'
      ? `<section class="panel" role="status">
<h2 style="margin-top:0">This payment is complete</h2>
<p>${total} was paid on this page. There is nothing more to do here.</p>
${session.successUrl ? `<p><a href="${escapeHtml(session.successUrl)}">Return to the booking</a></p>` : ''}
</section>`
      : `<section class="panel" role="status">
<h2 style="margin-top:0">This payment page has expired</h2>
<p>Nothing was charged. Go back and start the payment again to get a new page.</p>
${session.cancelUrl ? `<p><a href="${escapeHtml(session.cancelUrl)}">Return to the booking</a></p>` : ''}
</section>`;
  return layout({ body, lang: session.locale });
}

/**
 * @param {string} id
 * @returns {string}
 */
export function renderNotFoundPage(id) {
  const body = `<section class="panel" role="status">
<h2 style="margin-top:0">This payment page does not exist</h2>
<p>No payment is waiting under <code>${escapeHtml(id)}</code>. The local payment service may
have been restarted, which forgets open payments: start the payment again.</p>
</section>`;
  return layout({ body });
}

/**
 * Authentication for a PaymentIntent confirmed through the API (next_action redirect_to_url).
 * @param {{ intentId: string, amount: number, currency: string, done?: string }} input
 * @returns {string}
 */
export function renderIntentAuthenticationPage({ intentId, amount, currency, done }) {
  const total = escapeHtml(formatMinorUnits(amount, currency));
  const body = done
    ? `<section class="panel" role="status"><h2 style="margin-top:0">Authentication finished</h2>
<p>${escapeHtml(done)}</p></section>`
    : `<section class="panel" aria-labelledby="auth-heading">
<h2 id="auth-heading" style="margin-top:0">Your bank asks you to confirm this payment</h2>
<p>Amount: <strong>${total}</strong></p>
<form method="post" action="/pay/authenticate/${encodeURIComponent(intentId)}">
<div class="actions">
<button type="submit" name="outcome" value="complete">Complete authentication</button>
<button type="submit" name="outcome" value="fail" class="secondary">Fail authentication</button>
</div>
</form>
</section>`;
  return layout({ body });
}
