import { useParams } from "react-router";
import { ChangeOrderPage } from "@/features/change-orders";

/** The homeowner's change-order page behind its own link: public, no app shell. */
export function Component() {
  const { token = "" } = useParams();
  return <ChangeOrderPage key={token} token={token} />;
}
