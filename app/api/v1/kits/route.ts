import { collectionRoutes } from "../_lib/library-routes";

const routes = collectionRoutes("kits");
export const GET = routes.GET;
export const POST = routes.POST;
