// Request shapes of the caller's own routes (/me, /shops) and of the deposit checkout.
import { z } from "zod";
import { ShopNameSchema } from "@/model/names";

export const MePatchSchema = z.strictObject({ units: z.enum(["mm", "in"], { error: "units is mm or in." }) });
export const NewShopSchema = z.strictObject({ name: ShopNameSchema.optional() });
export const CheckoutSchema = z.strictObject({ jobId: z.string({ error: "Name the job." }).min(1, "Name the job.").max(100) });

export const MeSchema = z.object({
  me: z.object({
    userId: z.string(),
    name: z.string(),
    email: z.string(),
    emailVerified: z.boolean(),
    units: z.enum(["mm", "in"]),
    shopId: z.string(),
    shopName: z.string(),
    role: z.enum(["owner", "builder", "customer"]),
  }),
});
export const ShopsSchema = z.object({ shops: z.array(z.object({ id: z.string(), name: z.string(), role: z.string() })) });
