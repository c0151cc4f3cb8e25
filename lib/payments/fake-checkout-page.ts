import type { FakeSession } from "./fake-service";

/** The fake service's hosted checkout: plain HTML of our own look, clearly marked as a test. */

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function amount(session: FakeSession): string {
  const currency = session.currency.toUpperCase();
  const exponent = new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2;
  return new Intl.NumberFormat("en-GB", { style: "currency", currency }).format(session.amount_total / 10 ** exponent);
}

export function checkoutPage(session: FakeSession): string {
  const open = session.status === "open";
  const name = escape(session.line_items[0]?.name ?? "Payment");
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Test checkout · ${name}</title>
<style>
  body { margin: 0; font: 17px/1.55 system-ui, sans-serif; background: #efe9dc; color: #221c15; }
  main { max-width: 26rem; margin: 3rem auto; padding: 0 1rem; }
  .banner { background: #221c15; color: #f6d27a; padding: .5rem 1rem; font-size: .875rem; text-align: center; }
  .card { background: #fbf8f1; border: 1px solid #d8cfbd; border-radius: .75rem; padding: 1.5rem; box-shadow: 0 6px 18px -10px rgb(0 0 0 / .3); }
  h1 { font-size: 1.25rem; margin: 0 0 .25rem; }
  .total { font: 700 2rem/1.2 ui-monospace, monospace; margin: 1rem 0; }
  label { display: block; font-weight: 700; margin-top: .75rem; }
  input { width: 100%; box-sizing: border-box; min-height: 2.75rem; border: 1px solid #d8cfbd; border-radius: .375rem; padding: .5rem .75rem; font: inherit; background: #fff; }
  button { margin-top: 1.25rem; width: 100%; min-height: 2.75rem; border: 0; border-radius: .375rem; background: #d99a1e; color: #221c15; font: 700 1.0625rem system-ui, sans-serif; cursor: pointer; }
  a { color: #6b5d4a; }
  .muted { color: #6b5d4a; font-size: .875rem; }
</style></head>
<body>
<div class="banner">Test payment page of the local fake payment service. No card is charged.</div>
<main><div class="card">
  <h1>${name}</h1>
  <p class="muted">Pay ${escape(session.customer_email ?? "the workshop")}'s invoice.</p>
  <p class="total" data-testid="checkout-total">${escape(amount(session))}</p>
  ${
    open
      ? `<form method="post" action="/checkout/${escape(session.id)}/pay">
    <label for="card">Card number</label><input id="card" name="card" value="4242 4242 4242 4242" inputmode="numeric" autocomplete="off">
    <label for="holder">Name on card</label><input id="holder" name="holder" value="Test Customer" autocomplete="off">
    <button type="submit">Pay ${escape(amount(session))}</button>
  </form>
  <p class="muted"><a href="${escape(session.cancel_url ?? "/")}">Cancel and go back</a></p>`
      : `<p>This checkout is ${escape(session.status)}.</p>`
  }
</div></main></body></html>`;
}
