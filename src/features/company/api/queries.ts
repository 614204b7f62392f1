import { queryOptions } from "@tanstack/react-query";
import { getCompany } from "./get-company";

export const companyKeys = {
  all: ["company"] as const,
  profile: () => [...companyKeys.all, "profile"] as const,
};

export const companyQueries = {
  profile: () => queryOptions({ queryKey: companyKeys.profile(), queryFn: ({ signal }) => getCompany(signal), refetchOnWindowFocus: false }),
};
