import { QueryClientProvider } from "@tanstack/react-query";
import { useEffect, type ReactNode } from "react";
import { Toaster } from "@/components/ui/toaster";
import { authKeys } from "@/features/auth/api/queries";
import { onUnauthorized, queryClient } from "@/lib/query-client";

/** Any 401 means the session is gone: mark it so; the app shell then sends the user to sign-in. */
function useSessionEndHandling() {
  useEffect(
    () =>
      onUnauthorized(() => {
        if (queryClient.getQueryData(authKeys.me())) queryClient.setQueryData(authKeys.me(), null);
      }),
    [],
  );
}

export function AppProvider({ children }: { children: ReactNode }) {
  useSessionEndHandling();
  return (
    <QueryClientProvider client={queryClient}>
      {children}
      <Toaster />
    </QueryClientProvider>
  );
}
