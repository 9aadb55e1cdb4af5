declare module "perspective-transform" {
  interface PerspectiveTransform {
    coeffs: number[];
    coeffsInv: number[];
    transform(x: number, y: number): [number, number];
    transformInverse(x: number, y: number): [number, number];
  }
  export default function PerspT(srcPts: number[], dstPts: number[]): PerspectiveTransform;
}
