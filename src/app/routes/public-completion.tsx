import { useParams } from "react-router";
import { CompletionPage } from "@/features/jobs";

/** The homeowner's completion report behind the e-mailed link: public, no app shell. */
export function Component() {
  const { token = "" } = useParams();
  return <CompletionPage key={token} token={token} />;
}
