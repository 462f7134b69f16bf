import { request, type APIRequestContext } from "@playwright/test";
import { DEMO_PASSWORD } from "./sign-in-page";

import { BASE_URL } from "./e2e-env";

export { BASE_URL };

/** An API client that sends the Origin header our state-changing routes require. */
export async function apiClient(): Promise<APIRequestContext> {
  return request.newContext({ baseURL: BASE_URL, extraHTTPHeaders: { origin: BASE_URL } });
}

export async function signedInClient(email: string, password = DEMO_PASSWORD): Promise<APIRequestContext> {
  const client = await apiClient();
  const response = await client.post("/api/session", { data: { email, password } });
  if (response.status() !== 200) throw new Error(`sign-in as ${email} answered ${response.status()}`);
  return client;
}
