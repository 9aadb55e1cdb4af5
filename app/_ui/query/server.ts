import "server-only";
import { cache } from "react";
import { makeQueryClient } from "./make-client";

/** One QueryClient per server request (React's cache is scoped to a request). */
export const getServerQueryClient = cache(makeQueryClient);
