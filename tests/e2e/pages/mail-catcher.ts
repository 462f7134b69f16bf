import { expect } from "@playwright/test";
import { E2E_MAIL_HTTP_PORT } from "./e2e-env";

export interface CaughtMessage {
  to: string[];
  subject: string;
  text: string;
  html: string;
}

/** The messages the e2e server's SMTP catcher holds for one address, waiting until one arrives. */
export async function mailTo(address: string): Promise<CaughtMessage> {
  let found: CaughtMessage | undefined;
  await expect
    .poll(
      async () => {
        const response = await fetch(`http://127.0.0.1:${E2E_MAIL_HTTP_PORT}/messages`);
        const messages = (await response.json()) as CaughtMessage[];
        found = messages.find((m) => m.to.includes(address));
        return Boolean(found);
      },
      { timeout: 15_000 },
    )
    .toBe(true);
  return found!;
}
