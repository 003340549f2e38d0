// natural ships types only for its root entry, and the root entry loads database clients, so the
// one function Echoline needs is imported by its deep path and typed here.
declare module "natural/lib/natural/distance/jaro-winkler_distance.js" {
  export default function JaroWinklerDistance(
    s1: string,
    s2: string,
    options?: { dj?: number; ignoreCase?: boolean },
  ): number;
}
