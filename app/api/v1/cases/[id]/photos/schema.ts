// The case photo routes' request shapes live with the other request shapes.
export { CasePhotoPatchSchema, CasePhotoRequestSchema } from "@/model/schemas/case-photos";
