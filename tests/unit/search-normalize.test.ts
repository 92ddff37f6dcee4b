// Reading a catalog search the way imagers type it (synonyms: common practice in the hobby).
import { describe, expect, it } from "vitest";
import { normalizeWords, parseSearch } from "@/lib/search/normalize";

const words = (q: string) => parseSearch(q)?.groups.map((g) => g.word);

describe("normalizeWords", () => {
  it("forgives ×, x, dots and dashes", () => {
    expect(normalizeWords("Carousel 7 × 2in")).toBe("carousel 7 2in");
    expect(normalizeWords("carousel 7x2in")).toBe("carousel 7 2in");
    expect(normalizeWords("M42x0.75")).toBe("m42 075");
    expect(normalizeWords("T-thread")).toBe("t thread");
    expect(normalizeWords("  ")).toBe("");
  });
});

describe("parseSearch", () => {
  it("maps the trade's synonyms onto one word", () => {
    expect(words("off-axis guider")).toEqual(["guider"]);
    expect(words("OAG")).toEqual(["guider"]);
    expect(words("T2")).toEqual(words("M42×0.75"));
    expect(words("T-thread")).toEqual(words("t thread"));
    expect(words("2 inch")).toEqual(["2in"]);
    expect(words("50.8 mm")).toEqual(["2in"]);
    expect(words("field flattener")).toEqual(["flattener"]);
    expect(words("focal reducer")).toEqual(["reducer"]);
  });

  it("keeps a metric thread whole, so M42×1 is not “m42” and “1”", () => {
    expect(parseSearch("M42×1")?.groups).toEqual([{ word: "m42_1", synonyms: ["m42 1"] }]);
  });

  it("keeps the 2-inch barrel apart from the SCT thread", () => {
    expect(parseSearch("2in")?.groups[0].notBefore).toBe(" 24tpi");
    expect(words("SCT 2\"-24")).toEqual(["sct"]);
  });

  it("drops the × between numbers and empty queries", () => {
    expect(words("carousel 7 × 2in")).toEqual(["carousel", "7", "2in"]);
    expect(parseSearch(" - ")).toBeNull();
  });
});
