import { Link } from "react-router";
import { buttonStyles } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { SearchIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { paths } from "@/config/paths";

export function NotFoundContent() {
  return (
    <>
      <PageHeader title="Page not found" />
      <EmptyState
        icon={<SearchIcon />}
        title="There's nothing at this address"
        description="The link may be mistyped, or the page was moved or removed."
        action={
          <Link to={paths.app.projects.getHref()} className={buttonStyles()}>
            Go to projects
          </Link>
        }
      />
    </>
  );
}

export function Component() {
  return <NotFoundContent />;
}
