// Dates and times as every page shows them: "2 Dec 2026, 09:14" and "2 Dec 2026".
export const when = (iso: string | Date) => new Date(iso).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short" });
export const day = (iso: string | Date) => new Date(iso).toLocaleDateString("en-GB", { dateStyle: "medium" });
