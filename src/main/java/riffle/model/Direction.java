package riffle.model;

/** What a code says about the buying experience; reports and quotes group codes by it. */
public enum Direction {
  /** Something buyers liked or that drew them in. */
  PRAISE,
  /** Something that put buyers off or nearly stopped them. */
  FRICTION,
  /** Neither, or both. */
  NEUTRAL
}
