import { JOB_PHOTOS } from "@/app/api/v1/_lib/photo-routes";

export const { GET, PATCH } = JOB_PHOTOS.item;
