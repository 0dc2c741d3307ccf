import type { DriveProgressInput } from "@/lib/drives/progress";

// The worked drive-progress example shared by progress.test.ts and progress-wording.test.ts.
export const noStages = { good: 0, washed: 0, opened: 0, punched: 0, claimed: 0, builtIn: 0 };

/**
 * Worked example, by hand:
 *   units 120 + 120 + 200 = 440 cans; spare ⌈5 % × 440⌉ = ⌈22⌉ = 22; target 462.
 *   good cans 150 + 40 + 30 + 20 + 0 + 10 = 250; rejected 50 → yield 250/300 = 0.8333.
 *   unsorted: 120 hauled × 0.8333 = 100.
 *   remaining 462 − 250 = 212 (the 100 unsorted are not counted).
 *   heaters: 250 covers unit 1 (120, 130 left) and unit 2 (120, 10 left), not unit 3 (200) → 2 of 3.
 *   pace: window 2025-03-02..2025-03-15 holds 28 + 70 + 42 = 140 → 140/14 = 10 a day
 *         (2025-03-01 is outside the window, 2025-03-16 is in the future).
 *   finish: ⌈212/10⌉ = 22 days after 15 March → 6 April 2025.
 */
export const example: DriveProgressInput = {
  unitCans: [120, 120, 200],
  stages: { good: 150, washed: 40, opened: 30, punched: 20, claimed: 0, builtIn: 10 },
  rejectedCans: 50,
  hauledEstimate: 120,
  daily: [
    { date: "2025-03-01", goodCans: 100 },
    { date: "2025-03-02", goodCans: 28 },
    { date: "2025-03-10", goodCans: 70 },
    { date: "2025-03-15", goodCans: 42 },
    { date: "2025-03-16", goodCans: 999 },
  ],
  today: "2025-03-15",
};
