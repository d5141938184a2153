package org.morphscout.indexer.feature;

import java.util.List;

/**
 * Generates the built-in appearance model "gist-lab-v1" as ONNX bytes: a GIST descriptor (Oliva and Torralba,
 * "Modeling the shape of the scene: a holistic representation of the spatial envelope", IJCV 42(3), 2001) plus a
 * CIELAB colour layout. Nothing is trained or downloaded: every weight is computed here.
 *
 * <p>Input {@code image}: float32 [N, 4, 128, 128], N dynamic, prepared by {@link GistInput}: channel 0 = locally
 * contrast-normalised luminance, channels 1..3 = L*, a*, b* scaled to about [-1, 1].
 *
 * <p>Graph:
 *
 * <ol>
 *   <li>Channel 0 feeds a pyramid of 2x2 average pools: levels of 128, 64, 32 and 16 px (scales 0..3).
 *   <li>At each level: reflect-pad by 4 px, Conv with the 16 {@link GaborBank} kernels (8 orientations x even/odd,
 *       9x9), square, a 1x1 Conv that sums each even/odd pair and adds {@link #ENERGY_EPS}, Sqrt: the local energy
 *       {@code sqrt(even^2 + odd^2 + eps)} of 8 orientations.
 *   <li>Each energy map is average-pooled over a 4x4 grid of cells: [N, 8, 4, 4] per scale; concatenated over scales
 *       and flattened: 512 values, index {@code ((scale * 8 + orientation) * 4 + row) * 4 + column}.
 *   <li>Channels 1..3 average-pooled on the same 4x4 grid: 48 values, index {@code (channel * 4 + row) * 4 + column}.
 *   <li>Each part is L2-normalised (ReduceL2, +{@link #NORM_EPS}, Div), multiplied by {@link #GIST_WEIGHT} or
 *       {@link #COLOUR_WEIGHT}, the two concatenated (GIST first) and L2-normalised again: output {@code embedding}
 *       float32 [N, 560].
 * </ol>
 *
 * <p>The weights satisfy 0.8^2 + 0.6^2 = 1, so the cosine similarity of two embeddings is 0.64 x (GIST cosine) + 0.36
 * x (colour-layout cosine): texture and layout lead, colour still counts. Departure from Oliva and Torralba: they
 * filter in the frequency domain with Gabor transfer functions at full resolution; we filter spatially on a pyramid
 * to keep the graph cheap (about 30 million multiply-adds per image). {@link GistReference} computes the same thing
 * in plain Java.
 */
public final class GistModelBuilder {
  /** Identifier of the built-in model and its preprocessing; change it whenever the output could change. */
  public static final String MODEL_ID = "gist-lab-v1";

  public static final String INPUT = "image";
  public static final String OUTPUT = "embedding";
  public static final int SIZE = 128;
  public static final int CHANNELS = 4;
  public static final int SCALES = 4;
  public static final int GRID = 4;
  public static final int GIST_DIMENSION = SCALES * GaborBank.ORIENTATIONS * GRID * GRID;
  public static final int COLOUR_DIMENSION = 3 * GRID * GRID;
  public static final int DIMENSION = GIST_DIMENSION + COLOUR_DIMENSION;
  public static final float GIST_WEIGHT = 0.8f;
  public static final float COLOUR_WEIGHT = 0.6f;
  public static final float ENERGY_EPS = 1e-6f;
  public static final float NORM_EPS = 1e-12f;

  private GistModelBuilder() {}

  /** The serialised ModelProto. Deterministic: the same bytes every call. */
  public static byte[] build() {
    OnnxModelWriter m = new OnnxModelWriter("gist_lab");
    m.input(INPUT, "N", CHANNELS, SIZE, SIZE);
    m.output(OUTPUT, "N", DIMENSION);
    int o = GaborBank.ORIENTATIONS;
    m.floatTensor("gabor", new long[] {2L * o, 1, GaborBank.SIZE, GaborBank.SIZE}, GaborBank.weights());
    float[] pairSum = new float[o * 2 * o];
    float[] eps = new float[o];
    for (int k = 0; k < o; k++) {
      pairSum[k * 2 * o + k] = 1f;
      pairSum[k * 2 * o + o + k] = 1f;
      eps[k] = ENERGY_EPS;
    }
    m.floatTensor("pair_sum", new long[] {o, 2L * o, 1, 1}, pairSum);
    m.floatTensor("energy_eps", new long[] {o}, eps);
    m.int64Tensor("ch_lum_start", 0).int64Tensor("ch_lum_end", 1);
    m.int64Tensor("ch_lab_start", 1).int64Tensor("ch_lab_end", 4);
    m.int64Tensor("ch_axis", 1);
    int r = GaborBank.RADIUS;
    m.int64Tensor("reflect_pads", 0, 0, r, r, 0, 0, r, r);
    m.floatConstant("norm_eps", NORM_EPS);
    m.floatConstant("gist_weight", GIST_WEIGHT);
    m.floatConstant("colour_weight", COLOUR_WEIGHT);

    m.node("Slice", List.of(INPUT, "ch_lum_start", "ch_lum_end", "ch_axis"), "level0");
    m.node("Slice", List.of(INPUT, "ch_lab_start", "ch_lab_end", "ch_axis"), "lab");
    String[] gridPooled = new String[SCALES];
    for (int s = 0; s < SCALES; s++) {
      String level = "level" + s;
      if (s > 0) {
        m.node("AveragePool", List.of("level" + (s - 1)), level).ints("kernel_shape", 2, 2).ints("strides", 2, 2);
      }
      m.node("Pad", List.of(level, "reflect_pads"), "padded" + s).text("mode", "reflect");
      m.node("Conv", List.of("padded" + s, "gabor"), "response" + s).ints("kernel_shape", GaborBank.SIZE, GaborBank.SIZE);
      m.node("Mul", List.of("response" + s, "response" + s), "squared" + s);
      m.node("Conv", List.of("squared" + s, "pair_sum", "energy_eps"), "energy_sq" + s).ints("kernel_shape", 1, 1);
      m.node("Sqrt", List.of("energy_sq" + s), "energy" + s);
      int cell = (SIZE >> s) / GRID;
      gridPooled[s] = "grid" + s;
      m.node("AveragePool", List.of("energy" + s), gridPooled[s]).ints("kernel_shape", cell, cell).ints("strides", cell, cell);
    }
    m.node("Concat", List.of(gridPooled), "gist_grid").integer("axis", 1);
    m.node("Flatten", List.of("gist_grid"), "gist").integer("axis", 1);
    int cell = SIZE / GRID;
    m.node("AveragePool", List.of("lab"), "lab_grid").ints("kernel_shape", cell, cell).ints("strides", cell, cell);
    m.node("Flatten", List.of("lab_grid"), "colour").integer("axis", 1);
    normalise(m, "gist", "gist_unit");
    normalise(m, "colour", "colour_unit");
    m.node("Mul", List.of("gist_unit", "gist_weight"), "gist_weighted");
    m.node("Mul", List.of("colour_unit", "colour_weight"), "colour_weighted");
    m.node("Concat", List.of("gist_weighted", "colour_weighted"), "joined").integer("axis", 1);
    normalise(m, "joined", OUTPUT);
    return m.toBytes("morphscout", "GIST (Oliva and Torralba 2001) + CIELAB colour layout, " + MODEL_ID);
  }

  /** y = x / (||x||_2 + NORM_EPS) along axis 1 (opset 17 ReduceL2 takes axes as an attribute). */
  private static void normalise(OnnxModelWriter m, String in, String out) {
    m.node("ReduceL2", List.of(in), in + "_norm").ints("axes", 1).integer("keepdims", 1);
    m.node("Add", List.of(in + "_norm", "norm_eps"), in + "_norm_eps");
    m.node("Div", List.of(in, in + "_norm_eps"), out);
  }
}
