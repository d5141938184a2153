package org.morphscout.indexer.library;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.pairing.ImageFacts;
import org.morphscout.indexer.pairing.PairMeasures;
import org.morphscout.indexer.pairing.WarpMeasures;

/**
 * The byte layout of stored pair blobs (layout step 06), little-endian:
 *
 * <ul>
 *   <li>picture facts (21 bytes): width, height, components (int32 each), flags (one byte: 1 no object, 2 touches
 *       the frame, 4 uncertain silhouette), silhouette confidence and object area fraction (float32 each);
 *   <li>pair measures (88 bytes): the 14 cheap measures of {@link PairMeasures} in declaration order, then the 8 of
 *       {@link WarpMeasures} in declaration order (NaN when the warp was not estimated), float32 each.
 * </ul>
 *
 * Facts are single precision to begin with, so nothing is lost. Stateless.
 */
public final class StoredPairCodec {
  static final int PICTURE_BYTES = 4 * 3 + 1 + 4 * 2;
  static final int PAIR_FLOATS = 14 + 8;

  private StoredPairCodec() {}

  public static byte[] picture(ImageFacts f) {
    ByteBuffer b = ByteBuffer.allocate(PICTURE_BYTES).order(ByteOrder.LITTLE_ENDIAN);
    b.putInt(f.width()).putInt(f.height()).putInt(f.components());
    b.put((byte) ((f.empty() ? 1 : 0) | (f.touchesFrame() ? 2 : 0) | (f.uncertain() ? 4 : 0)));
    b.putFloat((float) f.confidence()).putFloat((float) f.areaFraction());
    return b.array();
  }

  static ImageFacts picture(byte[] bytes, long id) {
    if (bytes == null || bytes.length != PICTURE_BYTES) {
      throw damaged("picture facts of image " + id);
    }
    ByteBuffer b = ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN);
    int width = b.getInt();
    int height = b.getInt();
    int components = b.getInt();
    int flags = b.get();
    float confidence = b.getFloat();
    float area = b.getFloat();
    try {
      return new ImageFacts(width, height, (flags & 1) != 0, (flags & 2) != 0, components, confidence,
          (flags & 4) != 0, area);
    } catch (IllegalArgumentException e) {
      throw damaged("picture facts of image " + id);
    }
  }

  public static byte[] pair(PairMeasures m, WarpMeasures w) {
    ByteBuffer b = ByteBuffer.allocate(4 * PAIR_FLOATS).order(ByteOrder.LITTLE_ENDIAN);
    for (double v : new double[] {m.appearanceDistance(), m.deltaE00(), m.lightnessA(), m.lightnessB(), m.stdA(),
        m.stdB(), m.stdRatio(), m.aspectRatioGap(), m.resolutionRatio(), m.scaleRatio(), m.offset(),
        m.backgroundDeltaE(), m.exposureA(), m.exposureB()}) {
      b.putFloat((float) v);
    }
    if (w == null) {
      for (int i = 0; i < 8; i++) {
        b.putFloat(Float.NaN);
      }
    } else {
      for (double v : new double[] {w.iouBefore(), w.iouAligned(), w.iouWarped(), w.meanDisplacement(),
          w.maxDisplacement(), w.foldFraction(), w.turnedIou(), w.turnedRotation()}) {
        b.putFloat((float) v);
      }
    }
    return b.array();
  }

  static PairMeasures measures(byte[] bytes, long first, long second) {
    ByteBuffer b = check(bytes, first, second);
    double[] v = new double[14];
    for (int i = 0; i < v.length; i++) {
      v[i] = b.getFloat();
    }
    return new PairMeasures(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8], v[9], v[10], v[11], v[12], v[13]);
  }

  /** The warp's measures, or null when the warp was not estimated. */
  static WarpMeasures warp(byte[] bytes, long first, long second) {
    ByteBuffer b = check(bytes, first, second).position(4 * 14);
    double[] v = new double[8];
    for (int i = 0; i < v.length; i++) {
      v[i] = b.getFloat();
    }
    if (Double.isNaN(v[1])) {
      return null;
    }
    return new WarpMeasures(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7]);
  }

  private static ByteBuffer check(byte[] bytes, long first, long second) {
    if (bytes == null || bytes.length != 4 * PAIR_FLOATS) {
      throw damaged("measures of images " + first + " and " + second);
    }
    return ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN);
  }

  private static MorphscoutException damaged(String what) {
    return new MorphscoutException("the stored " + what + " are damaged: run index to measure them again");
  }
}
