import { VerifyPage } from "@/features/verify";

/** The public document check (no account, no app shell); its address is printed on every PDF. */
export function Component() {
  return <VerifyPage />;
}
