/**
 * What the homeowner page hands to whatever the route mounts in the deposit's place (the deposits
 * feature's PayDeposit). The page only supplies the facts; it never imports another feature.
 */
export interface DepositSlotProps {
  /** The homeowner's link token (the only credential the homeowner has). */
  token: string;
  /** Proposal status; the page offers the slot only when it is "accepted". */
  status: "accepted";
  /** The option the homeowner accepted. */
  acceptedOption: { id: string; name: string; totalCents: number; depositCents: number };
  company: { name: string; phone: string | null; email: string | null };
}
