import type { Browser, BrowserContext, Page } from "playwright-core";
import { newPage, signInAs } from "@/tests/support/browser";
import { emailOf, type Role, type Screen } from "./screens";

/** One signed-in browser context per role, opened on first use and kept for the file. */
export class RoleSessions {
  private sessions = new Map<Role, { context: BrowserContext; page: Page }>();

  constructor(
    private readonly browser: Browser,
    private readonly options: Parameters<Browser["newContext"]>[0],
  ) {}

  async page(role: Role): Promise<Page> {
    let session = this.sessions.get(role);
    if (!session) {
      session = await newPage(this.browser, this.options);
      const email = emailOf(role);
      if (email) await signInAs(session.page, email);
      this.sessions.set(role, session);
    }
    return session.page;
  }

  /** Opens a screen as its role and waits until its client data has arrived. */
  async open(screen: Screen): Promise<Page> {
    const page = await this.page(screen.role);
    await page.goto(screen.path);
    await page.waitForLoadState("networkidle");
    if (new URL(page.url()).pathname !== new URL(screen.path, page.url()).pathname) throw new Error(`${screen.path} as ${screen.role} ended on ${page.url()}`);
    return page;
  }

  async close(): Promise<void> {
    for (const { context } of this.sessions.values()) await context.close();
  }
}
