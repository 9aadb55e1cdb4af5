import { JOB_PHOTOS } from "@/app/api/v1/_lib/photo-routes";

export const { GET, POST } = JOB_PHOTOS.collection;
