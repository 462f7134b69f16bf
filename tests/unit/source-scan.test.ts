import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { hostAllowed, scanRepository, scanText, type ScanHit } from "./source-scan-rules";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));

// Samples are put together from pieces so that the scan of the tree does not find them in this file.
const spell = (...parts: string[]) => parts.join("");

function report(hits: ScanHit[]): string {
  return hits.map((h) => `${h.file}:${h.line}  ${h.kind}: ${h.text}`).join("\n");
}

describe("the source scan's rules", () => {
  it("flags a commercial web address and a bare commercial domain", () => {
    const address = spell("https://", "cool-tips", ".com/ac");
    const domain = spell("cool-tips", ".com");
    expect(scanText("x.ts", `source: "${address}"`).map((h) => h.kind)).toEqual(["address"]);
    expect(scanText("x.ts", `// see ${domain} for the table`)).toEqual([
      { file: "x.ts", line: 1, kind: "domain", text: domain },
    ]);
  });

  it("allows standards bodies, government publishers, reserved test names and the loopback address", () => {
    for (const host of ["sae.org", "www.ecfr.gov", "eur-lex.europa.eu", "www.w3.org", "nist.gov"])
      expect(hostAllowed(host), host).toBe(true);
    for (const host of ["harbourline.test", "evil.example", "example.com", "127.0.0.1", "localhost"])
      expect(hostAllowed(host), host).toBe(true);
    expect(hostAllowed(spell("not-sae", ".org"))).toBe(false);
    expect(hostAllowed(spell("sae.org", ".shop", ".com"))).toBe(false);
    expect(scanText("x.ts", 'const url = "http://127.0.0.1:3000/api/health";')).toEqual([]);
    expect(scanText("x.ts", "fetch(`http://${host}:3000`)")).toEqual([]);
  });

  it("does not take code for a domain: a logging call, psychrolib.SI, file names", () => {
    const logCall = spell("console", ".info");
    expect(scanText("x.ts", `${logCall}("ok"); psychrolib.SI; import "./route.ts"; x.at(-1);`)).toEqual([]);
  });

  it("flags the words that name study aids, course units and their codes, periodicals and recordings", () => {
    const samples = [
      spell("flash", "cards"),
      spell("qu", "iz"),
      spell("Jeo", "pardy"),
      spell("study ", "guide"),
      spell("Les", "son 4"),
      spell("Cool Channel T-", "22/8"),
      spell("maga", "zine"),
      spell("trade ", "press"),
      spell("technician train", "ing material"),
      spell("tran", "script"),
    ];
    for (const sample of samples)
      expect(
        scanText("x.ts", `source: "a rule (${sample})"`).some((h) => h.kind === "word"),
        sample,
      ).toBe(true);
  });

  it("flags a quoted title beside a citation, but not a quoted title elsewhere or an apostrophe", () => {
    const [q, open, close] = ["'", "\u2018", "\u2019"];
    const cited = `source: "common practice; ${q}Reading the Gauges${q} (2014)"`;
    expect(scanText("x.ts", cited).map((h) => h.kind)).toEqual(["quoted title"]);
    const wrapped = `  basis:\n    "a note ${open}Frozen Valves${close} from somewhere",`;
    expect(scanText("x.ts", wrapped).map((h) => h.kind)).toEqual(["quoted title"]);
    expect(scanText("x.ts", `const NAME = "Tips ${q}Frozen Valves${q}";`)).toEqual([]);
    expect(scanText("x.ts", `const names = { t1: ${q}Okafor, "Chi" N.${q} }; // source: test`)).toEqual([]);
    expect(scanText("x.ts", "text: \"Press 'Send to a senior' when done.\"")).toEqual([]);
    expect(scanText("x.ts", "source: \"the vehicle maker's procedure and the shop's rules\"")).toEqual([]);
  });
});

describe("source scan of the tree", () => {
  const { files, hits } = scanRepository(ROOT);

  it("reads the folders it is meant to read", () => {
    for (const sample of ["lib/service/sources.ts", "app/layout.tsx", "README.md", "DEVELOPERS.md"])
      expect(files).toContain(sample);
    expect(files.length).toBeGreaterThan(200);
  });

  it("finds no outside web address or domain, none of the flagged words and no quoted title beside a citation", () => {
    console.log(
      hits.length === 0
        ? `source scan: ${files.length} files, nothing found`
        : `source scan: ${files.length} files, ${hits.length} findings\n${report(hits)}`,
    );
    expect(report(hits)).toBe("");
  });
});
