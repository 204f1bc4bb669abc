// @ts-nocheck
// Errors raised below the app (repositories and domain rules); route handlers and actions map
// them to status codes and messages (app/_lib/errors.ts).
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
export class NotFoundError extends Error {
  readonly status = 404;
  constructor(what = stryMutAct_9fa48("2389") ? "" : (stryCov_9fa48("2389"), "Not found")) {
    super(what);
  }
}
export class ForbiddenError extends Error {
  readonly status = 403;
  constructor(message = stryMutAct_9fa48("2390") ? "" : (stryCov_9fa48("2390"), "You do not have permission to do that.")) {
    super(message);
  }
}
export class UnauthorizedError extends Error {
  readonly status = 401;
  constructor(message = stryMutAct_9fa48("2391") ? "" : (stryCov_9fa48("2391"), "Please sign in.")) {
    super(message);
  }
}

/** A save based on an out-of-date revision, or a duplicate key. */
export class ConflictError extends Error {
  readonly status = 409;
  constructor(message: string, readonly details?: Record<string, unknown>) {
    super(message);
  }
}

/** Input that passed the schema but breaks a rule of the data (names the field). */
export class FieldError extends Error {
  readonly status = 400;
  constructor(readonly field: string, message: string) {
    super(message);
  }
}

/** Another service the request needed failed (502) or is not set up (503); nothing was changed. */
export class UpstreamError extends Error {
  constructor(message: string, readonly status: 502 | 503 = 502) {
    super(message);
  }
}