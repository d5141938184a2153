package org.morphscout.indexer.pairing;

import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.silhouette.Silhouette;

/**
 * What a pair score needs to know about one of its pictures on its own: frame size and the silhouette's framing
 * facts. Kept with the stored pair measures so a stored pair can be scored without loading either analysis.
 *
 * @param width picture width in pixels, after EXIF orientation
 * @param height picture height in pixels
 * @param empty whether no object was found (the silhouette is empty)
 * @param touchesFrame whether the object touches the frame (cut off)
 * @param components how many separate objects the silhouette has
 * @param confidence the silhouette's confidence in [0, 1], kept at single precision
 * @param uncertain whether the silhouette is too doubtful to score a shape by ({@link Silhouette#uncertain()})
 * @param areaFraction the object's share of the picture, in [0, 1], kept at single precision
 */
public record ImageFacts(
    int width, int height, boolean empty, boolean touchesFrame, int components, double confidence,
    boolean uncertain, double areaFraction) {

  public ImageFacts {
    if (width < 1 || height < 1) {
      throw new IllegalArgumentException("picture size must be positive, got " + width + "x" + height);
    }
    confidence = PairFacts.single(confidence);
    areaFraction = PairFacts.single(areaFraction);
  }

  public static ImageFacts of(ImageAnalysis x) {
    Silhouette s = x.silhouette();
    return new ImageFacts(x.width(), x.height(), s.isEmpty(), s.touchesFrame(), s.components(), s.confidence(),
        s.uncertain(), x.shape().areaFraction());
  }
}
