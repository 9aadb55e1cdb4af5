import { JOB_PHOTOS } from "@/app/api/v1/_lib/photo-routes";

export const { POST } = JOB_PHOTOS.complete;
