import { queryOptions } from "@tanstack/react-query";
import { getInvite } from "./get-invite";
import { getMe } from "./get-me";

export const authKeys = {
  all: ["auth"] as const,
  me: () => [...authKeys.all, "me"] as const,
  invite: (token: string) => [...authKeys.all, "invite", token] as const,
};

export const authQueries = {
  /** The current session or null. Route loaders call `queryClient.ensureQueryData(authQueries.me())`. */
  me: () =>
    queryOptions({
      queryKey: authKeys.me(),
      queryFn: ({ signal }) => getMe(signal),
      staleTime: 60_000,
      meta: { isAuthProbe: true },
    }),
  invite: (token: string) =>
    queryOptions({
      queryKey: authKeys.invite(token),
      queryFn: ({ signal }) => getInvite(token, signal),
      staleTime: Infinity,
      meta: { isAuthProbe: true },
    }),
};
