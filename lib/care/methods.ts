/** How handles were cleaned. */
export const cleaningMethods = ["detergent-brush", "wipe-down", "other"] as const;
export type CleaningMethod = (typeof cleaningMethods)[number];

export const cleaningMethodLabels: Record<CleaningMethod, string> = {
  "detergent-brush": "Mild detergent and a soft brass brush, rinsed",
  "wipe-down": "Wiped down",
  other: "Another way (say how in the note)",
};
