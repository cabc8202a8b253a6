import { describe, expect, it } from "vitest";
import { emptyBenchProfile, benchProfileSchema, saveBenchProfileSchema } from "@/lib/validations/bench-profile";
import { profileSchema } from "@/lib/validations/account";
import { callbackPath, signInSchema } from "@/lib/validations/sign-in";
import { nameOnResults, publicName } from "@/lib/user-name";

describe("sign-in input", () => {
  it("normalises the address the way Auth.js does", () => {
    expect(signInSchema.parse({ email: "  Tester@Example.COM " }).email).toBe("tester@example.com");
  });

  it("only accepts paths on this site as the place to return to", () => {
    for (const ok of ["/account", "/account/bench-profiles?x=1", "/admin/users"])
      expect(callbackPath.parse(ok)).toBe(ok);
    for (const bad of [
      "//evil.example",
      "/\\evil.example",
      "https://evil.example/",
      "javascript:alert(1)",
      "account",
      "/a b",
    ]) {
      expect(callbackPath.parse(bad)).toBe("/account");
    }
    expect(signInSchema.parse({ email: "a@b.example" }).callbackUrl).toBe("/account");
  });
});

describe("bench profile input", () => {
  const filled = { ...emptyBenchProfile, name: "Bench", loadEquipment: "Load", resistanceMethod: "ac-1khz" };

  it("turns empty optional fields into nulls", () => {
    expect(benchProfileSchema.parse(filled)).toMatchObject({
      logger: null,
      calibratedOn: null,
      defaultAmbientC: null,
      defaultLoadMode: null,
      defaultSampleRateHz: null,
    });
  });

  it("accepts the edges of each range and refuses just outside them", () => {
    const ok = (patch: Record<string, string>) => benchProfileSchema.safeParse({ ...filled, ...patch }).success;
    expect(ok({ defaultAmbientC: "-20" })).toBe(true);
    expect(ok({ defaultAmbientC: "-20.1" })).toBe(false);
    expect(ok({ defaultAmbientC: "60" })).toBe(true);
    expect(ok({ defaultAmbientC: "60.5" })).toBe(false);
    expect(ok({ defaultCutoffVPerCell: "2.5" })).toBe(true);
    expect(ok({ defaultCutoffVPerCell: "4.2" })).toBe(true);
    expect(ok({ defaultCutoffVPerCell: "4.21" })).toBe(false);
    expect(ok({ defaultStopTemperatureC: "80" })).toBe(true);
    expect(ok({ defaultStopTemperatureC: "80.1" })).toBe(false);
    expect(ok({ defaultSampleRateHz: "0.5" })).toBe(true);
    expect(ok({ defaultSampleRateHz: "0" })).toBe(false);
    expect(ok({ defaultSampleRateHz: "ten" })).toBe(false);
    expect(ok({ resistanceMethod: "guess" })).toBe(false);
  });

  it("takes an id only for updates", () => {
    expect(saveBenchProfileSchema.parse({ ...filled, id: "" }).id).toBeNull();
    expect(saveBenchProfileSchema.parse({ ...filled, id: "12" }).id).toBe(12);
    expect(saveBenchProfileSchema.safeParse({ ...filled, id: "-3" }).success).toBe(false);
  });
});

describe("profile input and names", () => {
  it("reads the explicit choice of public name, and never takes an empty name for anonymity", () => {
    expect(profileSchema.parse({ displayName: "", publicName: "anonymous" }).anonymous).toBe(true);
    expect(profileSchema.parse({ displayName: "Some Name", publicName: "name" }).anonymous).toBe(false);
    expect(profileSchema.safeParse({ displayName: "" }).success).toBe(false);
    expect(profileSchema.safeParse({ displayName: "Some Name" }).success).toBe(false);
  });

  it("names people on results and in the header", () => {
    expect(nameOnResults({ displayName: "  Heron ", anonymous: false })).toBe("Heron");
    expect(nameOnResults({ displayName: "Heron", anonymous: true })).toBe("Anonymous tester");
    // No name and no choice of anonymity: not "anonymous", which they never asked for.
    expect(nameOnResults({ displayName: null, anonymous: false })).toBe("A contributor");
    expect(publicName({ displayName: null, email: "quiet@example.com" })).toBe("quiet");
  });
});
