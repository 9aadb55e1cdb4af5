import { CASE_PHOTOS } from "@/app/api/v1/_lib/photo-routes";

export const { GET, POST } = CASE_PHOTOS.collection;
