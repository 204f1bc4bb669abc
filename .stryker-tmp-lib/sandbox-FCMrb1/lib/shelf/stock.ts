// @ts-nocheck
// How a stock count shows in the shelf tables: none left is marked, in words as well as colour.
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
export const stockCell = stryMutAct_9fa48("4506") ? () => undefined : (stryCov_9fa48("4506"), (() => {
  const stockCell = (row: {
    stock: number;
  }) => (stryMutAct_9fa48("4509") ? row.stock !== 0 : stryMutAct_9fa48("4508") ? false : stryMutAct_9fa48("4507") ? true : (stryCov_9fa48("4507", "4508", "4509"), row.stock === 0)) ? stryMutAct_9fa48("4510") ? "" : (stryCov_9fa48("4510"), "0 (out)") : row.stock;
  return stockCell;
})());
export const stockClass = stryMutAct_9fa48("4511") ? () => undefined : (stryCov_9fa48("4511"), (() => {
  const stockClass = (row: {
    stock: number;
  }) => (stryMutAct_9fa48("4514") ? row.stock !== 0 : stryMutAct_9fa48("4513") ? false : stryMutAct_9fa48("4512") ? true : (stryCov_9fa48("4512", "4513", "4514"), row.stock === 0)) ? stryMutAct_9fa48("4515") ? "" : (stryCov_9fa48("4515"), "text-danger") : stryMutAct_9fa48("4516") ? "Stryker was here!" : (stryCov_9fa48("4516"), "");
  return stockClass;
})());