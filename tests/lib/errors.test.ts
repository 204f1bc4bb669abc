// lib/errors.ts: each error's status (RFC 9110 §15 status codes), its default message (the
// author's wording, shown to people by app/_lib/errors.ts) and the fields it carries.
import { describe, expect, it } from "vitest";
import { ConflictError, FieldError, ForbiddenError, NotFoundError, UnauthorizedError, UpstreamError } from "@/lib/errors";

describe("domain errors", () => {
  it("not found: 404, 'Not found' unless told what", () => {
    const e = new NotFoundError();
    expect([e instanceof Error, e.status, e.message]).toEqual([true, 404, "Not found"]);
    expect(new NotFoundError("No such combination").message).toBe("No such combination");
  });

  it("forbidden: 403 with a default sentence", () => {
    const e = new ForbiddenError();
    expect([e instanceof Error, e.status, e.message]).toEqual([true, 403, "You do not have permission to do that."]);
    expect(new ForbiddenError("Only the owner may share it.").message).toBe("Only the owner may share it.");
  });

  it("unauthorized: 401, asking to sign in", () => {
    const e = new UnauthorizedError();
    expect([e instanceof Error, e.status, e.message]).toEqual([true, 401, "Please sign in."]);
    expect(new UnauthorizedError("Your session ended.").message).toBe("Your session ended.");
  });

  it("conflict: 409 with its message and the details, when given", () => {
    const e = new ConflictError("Someone saved a newer revision.", { revision: 4 });
    expect([e instanceof Error, e.status, e.message, e.details]).toEqual([true, 409, "Someone saved a newer revision.", { revision: 4 }]);
    expect(new ConflictError("Taken").details).toBeUndefined();
  });

  it("field error: 400 naming the field", () => {
    const e = new FieldError("name", "That name is taken.");
    expect([e instanceof Error, e.status, e.field, e.message]).toEqual([true, 400, "name", "That name is taken."]);
  });

  it("upstream: 502 unless it says the service is not set up (503)", () => {
    const e = new UpstreamError("The payment service did not answer.");
    expect([e instanceof Error, e.status, e.message]).toEqual([true, 502, "The payment service did not answer."]);
    expect(new UpstreamError("Payments are not set up.", 503).status).toBe(503);
  });
});
