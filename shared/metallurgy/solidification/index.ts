// Re-exports of this topic's modules; each owner adds its own lines.
export {};
