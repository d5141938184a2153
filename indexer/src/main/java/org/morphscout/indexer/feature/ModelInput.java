package org.morphscout.indexer.feature;

import java.awt.image.BufferedImage;

/** How one image becomes one sample of a model's input tensor. Implementations are stateless and thread-safe. */
interface ModelInput {
  /** Shape of one sample without the batch axis, e.g. {4, 128, 128} (NCHW) or {224, 224, 3} (NHWC). */
  long[] sampleShape();

  /** The sample's values, row-major in {@link #sampleShape()}. */
  float[] prepare(BufferedImage image);

  /** Input of the built-in GIST model ({@link GistInput}). */
  static ModelInput gist() {
    return new ModelInput() {
      @Override
      public long[] sampleShape() {
        return new long[] {GistModelBuilder.CHANNELS, GistModelBuilder.SIZE, GistModelBuilder.SIZE};
      }

      @Override
      public float[] prepare(BufferedImage image) {
        return GistInput.prepare(image);
      }
    };
  }

  /** Input described by a user's {@link ModelDescription}: stretch, scale, subtract mean, divide by std. */
  static ModelInput of(ModelDescription d) {
    int w = d.inputWidth();
    int h = d.inputHeight();
    boolean nchw = d.layout() == ModelDescription.Layout.NCHW;
    boolean bgr = d.channelOrder() == ModelDescription.ChannelOrder.BGR;
    float[] mean = d.mean();
    float[] std = d.std();
    float scale = d.scale();
    return new ModelInput() {
      @Override
      public long[] sampleShape() {
        return nchw ? new long[] {3, h, w} : new long[] {h, w, 3};
      }

      @Override
      public float[] prepare(BufferedImage image) {
        int[] rgb = ImageResampler.resize(image, w, h);
        int plane = w * h;
        float[] out = new float[3 * plane];
        for (int i = 0; i < plane; i++) {
          for (int c = 0; c < 3; c++) {
            int rgbChannel = bgr ? 2 - c : c;
            int code = (rgb[i] >> (16 - 8 * rgbChannel)) & 0xFF;
            float v = (code * scale - mean[rgbChannel]) / std[rgbChannel];
            out[nchw ? c * plane + i : 3 * i + c] = v;
          }
        }
        return out;
      }
    };
  }
}
