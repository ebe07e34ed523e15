// The evaluation lives in lib/entries so the server recomputes blocks with the same code on save.
export * from "@/lib/entries/evaluate-solution-block";
