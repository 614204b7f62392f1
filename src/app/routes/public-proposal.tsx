import { useParams } from "react-router";
import { PayDeposit } from "@/features/deposits";
import { HomeownerPage } from "@/features/homeowner/pages/homeowner-page";

/** The homeowner's page behind the unguessable link: public, no app shell. The route composes the deposit block into it. */
export function Component() {
  const { token = "" } = useParams();
  return <HomeownerPage key={token} token={token} renderDeposit={({ token: t, company }) => <PayDeposit token={t} company={company} />} />;
}
