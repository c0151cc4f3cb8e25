import { chromium, type Browser, type BrowserContext } from "playwright-core";
import { baseUrl, type Client } from "./http";

/** Debian's Chromium through playwright-core (never a downloaded browser). */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
      "--no-first-run",
      "--disable-quic",
    ],
  });
}

/** A browser context signed in as `client` (null: signed out), `width` px wide. */
export async function contextFor(browser: Browser, client: Client | null, width = 1280, height = 900): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport: { width, height } });
  if (client) {
    const [name, value] = client.cookies.split("; ")[0].split(/=(.*)/s);
    // The session cookie is __Host- (Secure) in production; Chromium sends Secure cookies to http://localhost.
    await context.addCookies([{ name, value, url: baseUrl().replace(/^http:/, "https:") }]);
  }
  return context;
}
