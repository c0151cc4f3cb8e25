/**
 * What customer-facing pages and e-mails say about the set's insides: a plain reminder, in a customer's
 * words, not the bench's safety wording (discharging capacitors and current-limited supplies are the
 * technician's business, not a price list's).
 */

export const KEEP_THE_BACK_ON = {
  title: "Please keep the back on",
  /** While the set waits for the work: at home or on its way to us. */
  waiting:
    "The inside of a valve set can keep a harmful charge for a long while after it is unplugged. Please leave the back on and don't try the set yourself until we have been through it.",
  /** Once the set is home again. */
  home: "The inside of a valve set can keep a harmful charge for a long while after it is unplugged, so please leave the back on. If it smells hot, smokes or crackles, switch it off at the wall and give us a call.",
} as const;
