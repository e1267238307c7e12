/** Thrown inside the stereo engine when a case cannot be decided with certainty; becomes `refusal`. */
export class StereoRefusal extends Error {}
