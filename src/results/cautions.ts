/**
 * The cautions every output that states a verdict carries. They are the trade's plain rules for a
 * jammed machine (lockout/tagout per 29 CFR 1910.147, including (d)(5)(i) on stored energy), and
 * the limits of an estimate.
 */
export const CAUTIONS: readonly string[] = [
  "These results are engineering estimates from the stated model and inputs. They do not replace inspection, testing or a licensed engineer's judgement; local codes and the machine builder's instructions govern.",
  'Before anyone inspects a jammed machine, lock out and tag out every energy source, including the energy stored in a twisted shaft or a belt under tension. Never free a jam by hand, and never restart to "see what happens".',
  'A shaft that may have yielded is not returned to service on a calculation alone.',
];
