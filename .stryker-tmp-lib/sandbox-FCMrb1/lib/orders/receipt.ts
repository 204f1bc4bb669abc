// @ts-nocheck
// The two e-mails a paid deposit sends: a receipt for the customer and a notice for the shop.
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
import { formatPrice } from "./money";
import { ORDER_STATUS_LABELS, type OrderStatus } from "./status";
type PaidOrder = {
  id: string;
  customerName: string;
  currency: string;
  deposit: string;
  total: string;
  status: OrderStatus;
  paymentIntentId: string | null;
};
type Held = {
  partNumber: string;
  description: string;
  quantity: number;
  reserved: number;
  backOrdered: number;
};
export type OrderMail = {
  subject: string;
  text: string;
};
const partLine = stryMutAct_9fa48("3139") ? () => undefined : (stryCov_9fa48("3139"), (() => {
  const partLine = (r: Held) => stryMutAct_9fa48("3140") ? `` : (stryCov_9fa48("3140"), `  ${r.quantity} × ${r.description} (${r.partNumber}): ${(stryMutAct_9fa48("3143") ? r.backOrdered !== 0 : stryMutAct_9fa48("3142") ? false : stryMutAct_9fa48("3141") ? true : (stryCov_9fa48("3141", "3142", "3143"), r.backOrdered === 0)) ? stryMutAct_9fa48("3144") ? "" : (stryCov_9fa48("3144"), "reserved for you") : (stryMutAct_9fa48("3147") ? r.reserved !== 0 : stryMutAct_9fa48("3146") ? false : stryMutAct_9fa48("3145") ? true : (stryCov_9fa48("3145", "3146", "3147"), r.reserved === 0)) ? stryMutAct_9fa48("3148") ? "" : (stryCov_9fa48("3148"), "ordered in for you") : stryMutAct_9fa48("3149") ? `` : (stryCov_9fa48("3149"), `${r.reserved} reserved, ${r.backOrdered} ordered in`)}`);
  return partLine;
})());
export function customerReceipt(o: {
  order: PaidOrder;
  title: string;
  reservations: Held[];
  shopName: string;
}): OrderMail {
  if (stryMutAct_9fa48("3150")) {
    {}
  } else {
    stryCov_9fa48("3150");
    const price = stryMutAct_9fa48("3151") ? () => undefined : (stryCov_9fa48("3151"), (() => {
      const price = (a: string) => formatPrice(a, o.order.currency);
      return price;
    })());
    const text = (stryMutAct_9fa48("3152") ? [] : (stryCov_9fa48("3152"), [stryMutAct_9fa48("3153") ? `` : (stryCov_9fa48("3153"), `Hello ${o.order.customerName},`), stryMutAct_9fa48("3154") ? "Stryker was here!" : (stryCov_9fa48("3154"), ""), stryMutAct_9fa48("3155") ? `` : (stryCov_9fa48("3155"), `thank you: we received your deposit of ${price(o.order.deposit)} for "${o.title}".`), stryMutAct_9fa48("3156") ? `` : (stryCov_9fa48("3156"), `The quoted total is ${price(o.order.total)}; the rest is due when the work is done.`), stryMutAct_9fa48("3157") ? "Stryker was here!" : (stryCov_9fa48("3157"), ""), ...(o.reservations.length ? stryMutAct_9fa48("3158") ? [] : (stryCov_9fa48("3158"), [stryMutAct_9fa48("3159") ? "" : (stryCov_9fa48("3159"), "Your parts:"), ...o.reservations.map(partLine), stryMutAct_9fa48("3160") ? "Stryker was here!" : (stryCov_9fa48("3160"), "")]) : stryMutAct_9fa48("3161") ? ["Stryker was here"] : (stryCov_9fa48("3161"), [])), stryMutAct_9fa48("3162") ? `` : (stryCov_9fa48("3162"), `Payment reference: ${stryMutAct_9fa48("3163") ? o.order.paymentIntentId && "–" : (stryCov_9fa48("3163"), o.order.paymentIntentId ?? (stryMutAct_9fa48("3164") ? "" : (stryCov_9fa48("3164"), "–")))}`), stryMutAct_9fa48("3165") ? `` : (stryCov_9fa48("3165"), `Order: ${o.order.id}`), stryMutAct_9fa48("3166") ? "Stryker was here!" : (stryCov_9fa48("3166"), ""), stryMutAct_9fa48("3167") ? "" : (stryCov_9fa48("3167"), "We will be in touch to book the fitting and the dyno session."), stryMutAct_9fa48("3168") ? "Stryker was here!" : (stryCov_9fa48("3168"), ""), o.shopName])).join(stryMutAct_9fa48("3169") ? "" : (stryCov_9fa48("3169"), "\n"));
    return stryMutAct_9fa48("3170") ? {} : (stryCov_9fa48("3170"), {
      subject: stryMutAct_9fa48("3171") ? `` : (stryCov_9fa48("3171"), `Deposit received: ${o.title}`),
      text
    });
  }
}
export function shopNotice(o: {
  order: PaidOrder;
  title: string;
  reservations: Held[];
  orderUrl: string;
}): OrderMail {
  if (stryMutAct_9fa48("3172")) {
    {}
  } else {
    stryCov_9fa48("3172");
    const price = stryMutAct_9fa48("3173") ? () => undefined : (stryCov_9fa48("3173"), (() => {
      const price = (a: string) => formatPrice(a, o.order.currency);
      return price;
    })());
    const short = stryMutAct_9fa48("3174") ? o.reservations : (stryCov_9fa48("3174"), o.reservations.filter(stryMutAct_9fa48("3175") ? () => undefined : (stryCov_9fa48("3175"), r => stryMutAct_9fa48("3179") ? r.backOrdered <= 0 : stryMutAct_9fa48("3178") ? r.backOrdered >= 0 : stryMutAct_9fa48("3177") ? false : stryMutAct_9fa48("3176") ? true : (stryCov_9fa48("3176", "3177", "3178", "3179"), r.backOrdered > 0))));
    const text = (stryMutAct_9fa48("3180") ? [] : (stryCov_9fa48("3180"), [stryMutAct_9fa48("3181") ? `` : (stryCov_9fa48("3181"), `${o.order.customerName} paid a deposit of ${price(o.order.deposit)} (total ${price(o.order.total)}) for "${o.title}".`), stryMutAct_9fa48("3182") ? `` : (stryCov_9fa48("3182"), `Status: ${ORDER_STATUS_LABELS[o.order.status]}.`), stryMutAct_9fa48("3183") ? "Stryker was here!" : (stryCov_9fa48("3183"), ""), ...(o.reservations.length ? stryMutAct_9fa48("3184") ? [] : (stryCov_9fa48("3184"), [stryMutAct_9fa48("3185") ? "" : (stryCov_9fa48("3185"), "Parts:"), ...o.reservations.map(partLine), stryMutAct_9fa48("3186") ? "Stryker was here!" : (stryCov_9fa48("3186"), "")]) : stryMutAct_9fa48("3187") ? ["Stryker was here"] : (stryCov_9fa48("3187"), [])), ...(short.length ? stryMutAct_9fa48("3188") ? [] : (stryCov_9fa48("3188"), [stryMutAct_9fa48("3189") ? `` : (stryCov_9fa48("3189"), `To order in: ${short.map(stryMutAct_9fa48("3190") ? () => undefined : (stryCov_9fa48("3190"), r => stryMutAct_9fa48("3191") ? `` : (stryCov_9fa48("3191"), `${r.backOrdered} × ${r.partNumber}`))).join(stryMutAct_9fa48("3192") ? "" : (stryCov_9fa48("3192"), ", "))}.`), stryMutAct_9fa48("3193") ? "Stryker was here!" : (stryCov_9fa48("3193"), "")]) : stryMutAct_9fa48("3194") ? ["Stryker was here"] : (stryCov_9fa48("3194"), [])), stryMutAct_9fa48("3195") ? `` : (stryCov_9fa48("3195"), `Open the order: ${o.orderUrl}`)])).join(stryMutAct_9fa48("3196") ? "" : (stryCov_9fa48("3196"), "\n"));
    return stryMutAct_9fa48("3197") ? {} : (stryCov_9fa48("3197"), {
      subject: stryMutAct_9fa48("3198") ? `` : (stryCov_9fa48("3198"), `${short.length ? stryMutAct_9fa48("3199") ? "" : (stryCov_9fa48("3199"), "Back-order needed") : stryMutAct_9fa48("3200") ? "" : (stryCov_9fa48("3200"), "Deposit paid")}: ${o.order.customerName}`),
      text
    });
  }
}