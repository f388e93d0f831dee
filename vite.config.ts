import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";
import mdx from "@mdx-js/rollup";
import remarkFrontmatter from "remark-frontmatter";
import remarkMdxFrontmatter from "remark-mdx-frontmatter";
import remarkGfm from "remark-gfm";
import remarkMath from "remark-math";
import rehypeKatex from "rehype-katex";
import { mdxHeadingIdsPlugin, remarkHeadingIds } from "./src/components/mdx/pipeline/heading-ids";
import { fileURLToPath } from "node:url";

const root = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const apiPort = process.env.PORT ?? "3000";

export default defineConfig({
  plugins: [
    // MDX must run before the React plugin, which must also see .mdx output.
    mdxHeadingIdsPlugin(),
    {
      enforce: "pre",
      ...mdx({
        remarkPlugins: [remarkFrontmatter, remarkMdxFrontmatter, remarkGfm, remarkMath, remarkHeadingIds],
        rehypePlugins: [rehypeKatex],
        providerImportSource: "@mdx-js/react",
      }),
    },
    react({ include: /\.(mdx|js|jsx|ts|tsx)$/ }),
    tailwindcss(),
  ],
  resolve: {
    alias: {
      "@": root("./src"),
      "@shared": root("./shared"),
    },
  },
  server: {
    proxy: { "/api": `http://localhost:${apiPort}` },
  },
  worker: { format: "es" },
  build: {
    outDir: "dist",
    sourcemap: false,
    chunkSizeWarningLimit: 700,
    // No data: URIs, so the strict Content-Security-Policy never has to allow them.
    assetsInlineLimit: 0,
    rolldownOptions: {
      output: {
        // Long-lived vendor chunks for what every page needs; konva, mathjs and the
        // simulations stay in the lazy chunks of the pages that import them.
        codeSplitting: {
          groups: [
            { name: "react", test: /node_modules[\\/](react|react-dom|scheduler|react-router|cookie|set-cookie-parser)[\\/]/ },
            { name: "query", test: /node_modules[\\/]@tanstack[\\/](query-core|react-query)[\\/]/ },
          ],
        },
      },
    },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["tests/shared/**/*.test.ts", "tests/server/**/*.test.ts", "tests/src/**/*.test.{ts,tsx}", "tests/content/**/*.test.ts"],
          environment: "node",
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: "browser",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
    reporters: ["default", "json"],
    outputFile: { json: "tests/artifacts/vitest-report.json" },
  },
});
