// The section skeleton while this page reads its data.
export { default } from "@/app/(app)/loading";
