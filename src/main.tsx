import "@/zod-setup";
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { RouterProvider } from "react-router";
import { createQueryClient } from "@/api/query-client";
import { AppProviders } from "@/app/providers";
import { createAppRouter } from "@/app/router";
import "@/styles/index.css";

const queryClient = createQueryClient();
const router = createAppRouter(queryClient);
const container = document.getElementById("root");
if (!container) throw new Error("index.html must contain <div id=\"root\">.");

createRoot(container).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);
