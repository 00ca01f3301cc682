package riffle.model;

/**
 * One point of the saturation curve.
 *
 * @param answers answers coded so far, in coding order
 * @param codes distinct codes given to them
 */
public record SaturationPoint(int answers, int codes) {}
