import { CASE_PHOTOS } from "@/app/api/v1/_lib/photo-routes";

export const { POST } = CASE_PHOTOS.complete;
