import { CASE_PHOTOS } from "@/app/api/v1/_lib/photo-routes";

export const { GET, PATCH } = CASE_PHOTOS.item;
export const DELETE = CASE_PHOTOS.remove;
