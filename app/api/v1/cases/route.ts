import { collectionRoutes } from "../_lib/library-routes";

const routes = collectionRoutes("cases");
export const GET = routes.GET;
export const POST = routes.POST;
