export * from "@/lib/rigging/types";
export * from "@/lib/rigging/round";
export * from "@/lib/rigging/geometry";
export * from "@/lib/rigging/adjust";
export * from "@/lib/rigging/limits";
export * from "@/lib/rigging/plan";
