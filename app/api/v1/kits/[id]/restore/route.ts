import { archiveRoute } from "../../../_lib/library-routes";

export const POST = archiveRoute("kits", false);
