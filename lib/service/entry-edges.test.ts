import { describe, expect, it } from "vitest";
import {
  readGaugeKpa,
  readMassG,
  readPlainNumber,
  readTemperatureC,
  readVacuumKpaAbs,
  readVolumeMl,
} from "./entry";

// The edges of what a typed entry reads as: blank stays blank, zero is a figure, the reader's locale is
// passed on, and each message says what is wrong.
describe("typed entries: blank, zero, locale and messages", () => {
  const readers = {
    mass: (t: string) => readMassG(t),
    volume: (t: string) => readVolumeMl(t),
    vacuum: (t: string) => readVacuumKpaAbs(t),
    gauge: (t: string) => readGaugeKpa(t),
    temperature: (t: string) => readTemperatureC(t),
    plain: (t: string) => readPlainNumber(t, "a percentage"),
  };

  it("leaves an empty or blank field empty, never an error", () => {
    for (const [name, read] of Object.entries(readers)) {
      expect(read(""), name).toEqual({ empty: true });
      expect(read("   "), name).toEqual({ empty: true });
    }
    expect(readPlainNumber(" % ", "a percentage")).toEqual({ empty: true });
  });

  it("takes zero as a figure and refuses a negative mass or volume with its own message", () => {
    expect(readMassG("0")).toEqual({ value: 0 });
    expect(readVolumeMl("0")).toEqual({ value: 0 });
    expect(readMassG("-5")).toEqual({ error: "A mass cannot be negative." });
    expect(readVolumeMl("-5")).toEqual({ error: "A volume cannot be negative." });
  });

  it("reads a bare number in each reader's default unit: kPa gauge, °C, inHg below the atmosphere", () => {
    expect(readGaugeKpa("210")).toEqual({ value: 210 });
    expect(readTemperatureC("25")).toEqual({ value: 25 });
    expect(readVacuumKpaAbs("29")).toEqual(readVacuumKpaAbs("29 inHg"));
  });

  it("passes the reader's locale on: 1,500 is ambiguous to a German reader", () => {
    expect(readMassG("1,500", "g")).toEqual({ value: 1500 });
    expect(readMassG("1,500", "g", "de-DE")).toHaveProperty("ambiguous");
    expect(readVolumeMl("1,500", "mL", "de-DE")).toHaveProperty("ambiguous");
    expect(readGaugeKpa("1,500", "kPa", "de-DE")).toHaveProperty("ambiguous");
    expect(readTemperatureC("1,500", "C", "de-DE")).toHaveProperty("ambiguous");
  });

  it("refuses an absolute pressure and an unreadable one or temperature with the parser's message", () => {
    expect(readGaugeKpa("30 psia")).toEqual({ error: "Give the gauge reading, not an absolute pressure." });
    expect(readGaugeKpa("warm")).toMatchObject({
      error: expect.stringMatching(/^Could not read “warm” as a pressure/),
    });
    expect(readTemperatureC("warm")).toMatchObject({
      error: expect.stringMatching(/^Could not read “warm” as a temperature/),
    });
  });

  it("drops a trailing %, min or minute(s) from a plain number, with or without a space, and reads a decimal comma", () => {
    for (const text of ["5", "5%", "5 %", " 5 % ", "5min", "5 min", "5 minute", "5 minutes"])
      expect(readPlainNumber(text, "a number"), text).toEqual({ value: 5 });
    expect(readPlainNumber("99,2 %", "a percentage")).toEqual({ value: 99.2 });
    expect(readPlainNumber("%5", "a percentage")).toHaveProperty("error");
    expect(readPlainNumber(" abc ", "a percentage")).toEqual({
      error: "Could not read “abc” as a percentage.",
    });
  });
});
