import { queryOptions } from "@tanstack/react-query";
import { getOutbox } from "./get-outbox";

export const outboxKeys = {
  all: ["outbox"] as const,
  list: () => [...outboxKeys.all, "list"] as const,
};

export const outboxQueries = {
  list: () =>
    queryOptions({
      queryKey: outboxKeys.list(),
      queryFn: ({ signal }) => getOutbox(signal),
      select: (data) =>
        [...data.messages].sort((a, b) => new Date(b.createdAt).getTime() - new Date(a.createdAt).getTime()),
    }),
};
