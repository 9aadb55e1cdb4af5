import { itemRoutes } from "../../_lib/library-routes";

const routes = itemRoutes("rigs");
export const GET = routes.GET;
export const PATCH = routes.PATCH;
export const DELETE = routes.DELETE;
