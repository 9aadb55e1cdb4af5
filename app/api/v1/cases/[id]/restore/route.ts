import { archiveRoute } from "../../../_lib/library-routes";

export const POST = archiveRoute("cases", false);
