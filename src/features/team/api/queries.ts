import { queryOptions } from "@tanstack/react-query";
import { getTeam } from "./get-team";

export const teamKeys = {
  all: ["team"] as const,
  list: () => [...teamKeys.all, "list"] as const,
};

export const teamQueries = {
  list: () => queryOptions({ queryKey: teamKeys.list(), queryFn: ({ signal }) => getTeam(signal) }),
};
