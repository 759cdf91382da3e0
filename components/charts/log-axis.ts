// Moved to lib/charts so the documents (lib/documents) draw their charts with the same axes.
export * from "@/lib/charts/log-axis";
