import { z } from "zod";

export const setGearSchema = z.object({
  partId: z.string().trim().min(1, "Choose a part").max(160),
  quantity: z.number().int("A whole number").min(0, "0 removes it").max(99, "At most 99"),
});
export type SetGearInput = z.infer<typeof setGearSchema>;
