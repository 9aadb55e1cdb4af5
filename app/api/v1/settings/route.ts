import { requireCaller } from "@/db/access";
import { getSettings, updateSettings } from "@/db/settings";
import { SettingsPatchSchema } from "@/model/schemas";
import { api, bodyOf, json, staff } from "../_lib/http";

/** The shop's units and limits, each limit filled and the defaulted ones named (owner and builder). */
export const GET = api(async () => {
  const caller = await staff();
  return json(await getSettings(caller));
});

/** Changes the shop's units or limits (owner only). */
export const PATCH = api(async (req: Request) => {
  const caller = await requireCaller(["owner"]);
  return json(await updateSettings(caller, await bodyOf(req, SettingsPatchSchema)));
});
