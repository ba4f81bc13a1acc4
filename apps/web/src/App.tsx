import { useState } from "react";
import { QueryClientProvider } from "@tanstack/react-query";
import { RouterProvider } from "react-router";
import { prefetchMe } from "./api/auth";
import { createQueryClient } from "./api/queryClient";
import { createAppRouter } from "./router";

export function App() {
  // the user request starts before the router begins loading the route's chunk: both run at once
  const [queryClient] = useState(() => {
    const client = createQueryClient();
    prefetchMe(client);
    return client;
  });
  const [router] = useState(createAppRouter);
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  );
}
