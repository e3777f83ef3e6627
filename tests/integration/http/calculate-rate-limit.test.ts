import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { POST } from "@/app/api/v1/calculate/route";

const BODY = JSON.stringify({
  units: "imperial",
  operation: {
    kind: "slotting",
    diameter: { value: 0.25, unit: "in" },
    flutes: 2,
    spindleSpeed: { value: 18000, unit: "rpm" },
    feed: { value: 100, unit: "in/min" },
    axialDepth: { value: 0.125, unit: "in" },
    radialDepth: { value: 0.25, unit: "in" },
  },
  material: {
    cuttingSpeedWindow: { min: 300, max: 1200, unit: "SFM" },
    minChipLoad: { value: 0.002, unit: "in/tooth" },
    specificCuttingForce: { value: 100, unit: "N/mm²" },
  },
  referenceMachine: { rigidity: 0.8 },
  machine: {
    spindleSpeed: { min: 8000, max: 12000, unit: "rpm" },
    maxFeed: { value: 150, unit: "in/min" },
    spindlePower: { value: 0.8, unit: "kW" },
    rigidity: 0.5,
  },
});

// Headers as the app's server stamps them (lib/http/record-peer-address.ts): the TCP peer, and the
// X-Forwarded-For the request arrived with.
const call = (peer: string, forwarded: string) =>
  POST(
    new NextRequest("http://127.0.0.1/api/v1/calculate", {
      method: "POST",
      body: BODY,
      headers: {
        "content-type": "application/json",
        "x-forwarded-for": forwarded,
        "x-swarfbook-peer": peer,
        "x-swarfbook-forwarded-for": forwarded,
      },
    }),
  );

describe("calculate rate limit", () => {
  it("150 calls with a rotating X-Forwarded-For are limited as one client", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 150; i++) statuses.push((await call("10.33.0.1", `198.51.100.${i % 250}`)).status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(120);
    expect(statuses.filter((s) => s === 429)).toHaveLength(30);
    // Another client is not affected.
    expect((await call("10.33.0.2", "198.51.100.1")).status).toBe(200);
  });

  it("behind a trusted proxy, the address the proxy saw is the client, whatever the client prepended", async () => {
    process.env.TRUSTED_PROXIES = "127.0.0.1";
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 125; i++) statuses.push((await call("127.0.0.1", `6.6.${i}.6, 10.34.0.1`)).status);
      expect(statuses.filter((s) => s === 429)).toHaveLength(5);
      expect((await call("127.0.0.1", "10.34.0.2")).status).toBe(200);
    } finally {
      delete process.env.TRUSTED_PROXIES;
    }
  });
});
