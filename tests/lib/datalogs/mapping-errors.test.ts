// lib/datalogs/mapping-errors.ts: every problem of a mapping under its field, several on one field
// kept in order, and a problem with the mapping as a whole filed under the delimiter (the form's
// first field). Zod stops at a field's first failed check, so one field holds one message here. Messages are the schema's own wording in lib/datalogs/parse.ts.
import { describe, expect, it } from "vitest";
import type { DatalogMappingInput } from "@/lib/datalogs/parse";
import { mappingFieldErrors } from "@/lib/datalogs/mapping-errors";

const ok: DatalogMappingInput = { delimiter: ",", rpm: 0, pressure: 1, pressureKind: "gauge", pressureUnit: "psi" };

describe("mappingFieldErrors", () => {
  it("a good mapping has none", () => {
    expect(mappingFieldErrors(ok)).toEqual({});
  });

  it("files each problem under its field, in the schema's order", () => {
    expect(mappingFieldErrors({ ...ok, decimalComma: true, rpm: -1, throttle: 1 })).toEqual({
      rpm: ["Pick the column for engine speed"],
      decimalComma: ["Decimal commas need a delimiter other than the comma"],
      throttle: ["Column 2 is already used for manifold pressure; pick another column for throttle"],
    });
  });

  it("a column used twice is refused on each later field", () => {
    expect(mappingFieldErrors({ ...ok, time: 0, throttle: 0 })).toEqual({
      time: ["Column 1 is already used for engine speed; pick another column for time"],
      throttle: ["Column 1 is already used for engine speed; pick another column for throttle"],
    });
  });

  it("a mapping that is not an object at all is filed under the delimiter", () => {
    const e = mappingFieldErrors(null as unknown as DatalogMappingInput);
    expect(Object.keys(e)).toEqual(["delimiter"]);
    expect(e.delimiter).toHaveLength(1);
  });
});
