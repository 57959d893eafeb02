export { default } from "@/components/ui/loading-state";
