// Prints the client JavaScript shipped for the interview route (gzip) and the time from a keystroke
// in a reading to the recomputed values on screen. Figures to read; nothing here passes or fails.
// Needs a production build (`npx next build`). Starts its own throwaway database and server
// (scripts/e2e-server.sh on port 3100, or E2E_PORT) unless BENCH_URL points at a running one.
import { chromium } from "@playwright/test";
import { APP_BASE as BASE, recordScripts, startBenchApp, totalKb } from "./browser-app";

const KEYSTROKES = 60;

function percentile(sorted: number[], p: number) {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}

async function main() {
  const app = await startBenchApp();
  try {
    const browser = await chromium.launch({
      executablePath: "/usr/bin/chromium",
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    });
    const context = await browser.newContext({
      baseURL: BASE,
      viewport: { width: 412, height: 915 },
      isMobile: true,
      hasTouch: true,
    });
    const page = await context.newPage();
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill("tech@harbourline.test");
    await page.getByLabel("Password").fill("chill-demo-2026");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/cases$/);

    const created = await page.request.post("/api/cases", {
      headers: { origin: BASE },
      data: { vehicleId: 1, complaint: "Benchmark case: warm air at idle." },
    });
    const caseId = ((await created.json()) as { case: { id: number } }).case.id;
    const detail = (await (await page.request.get(`/api/cases/${caseId}`)).json()) as {
      case: { version: number; answers: { answers: object } };
    };
    await page.request.put(`/api/cases/${caseId}/interview`, {
      headers: { origin: BASE },
      data: {
        baseVersion: detail.case.version,
        step: "running",
        answers: { ...detail.case.answers.answers, conditions: { ambientC: 32 } },
        drafts: {},
        skipped: ["static"],
        visited: ["complaint", "system", "conditions", "static"],
      },
    });

    // Every script the browser loads for the interview route, measured as a server would send it.
    const scripts = recordScripts(page);
    await page.goto(`/cases/${caseId}/interview`, { waitUntil: "networkidle" });
    await page.getByRole("heading", { name: "Running readings" }).waitFor();

    // Keystroke → recomputed readout: keydown's timestamp to the mutation that rewrote the readout.
    const high = page.getByRole("textbox", { name: "High side" });
    await high.click();
    await page.evaluate(() => {
      const w = window as unknown as { __samples: number[]; __t0: number };
      w.__samples = [];
      document.addEventListener("keydown", (e) => (w.__t0 = e.timeStamp), true);
      const observer = new MutationObserver(() => {
        if (w.__t0) {
          w.__samples.push(performance.now() - w.__t0);
          w.__t0 = 0;
        }
      });
      observer.observe(document.getElementById("interview-step")!, {
        subtree: true,
        childList: true,
        characterData: true,
      });
    });
    for (let i = 0; i < KEYSTROKES; i++) {
      await high.fill("");
      await page.keyboard.type(String(1200 + i * 10), { delay: 20 });
    }
    const samples = (
      await page.evaluate(() => (window as unknown as { __samples: number[] }).__samples)
    ).sort((a, b) => a - b);
    await browser.close();

    console.log(
      `interview route, client JavaScript: ${scripts.size} files, ${totalKb(scripts).toFixed(1)} kB gzip`,
    );
    for (const [url, size] of [...scripts.entries()].sort((a, b) => b[1] - a[1]).slice(0, 8)) {
      console.log(`  ${(size / 1024).toFixed(1).padStart(6)} kB  ${new URL(url).pathname}`);
    }
    console.log(
      `keystroke → recomputed values on screen (${samples.length} samples): p50 ${percentile(samples, 50).toFixed(1)} ms, p95 ${percentile(samples, 95).toFixed(1)} ms, p99 ${percentile(samples, 99).toFixed(1)} ms`,
    );
  } finally {
    await app.stop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
