package org.morphscout.indexer.feature;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.morphscout.indexer.MorphscoutException;

/**
 * How to feed a user-supplied ONNX image model and read an appearance vector from it. Immutable, validated on
 * construction. Each input value is {@code (code * scale - mean[c]) / std[c]}, where code is the 8-bit sRGB channel
 * value after the image is stretched to the input size over mid-grey ({@link ImageResampler}). The output is always
 * L2-normalised.
 *
 * <p>Defaults ({@link #defaults(Path)}) suit ImageNet-trained CNNs (common practice): 224x224, RGB, NCHW, mean
 * (0.485, 0.456, 0.406), std (0.229, 0.224, 0.225), scale 1/255, first output, global average pooling on.
 *
 * @param modelFile the .onnx file
 * @param inputWidth input width in px, 1..4096
 * @param inputHeight input height in px, 1..4096
 * @param channelOrder order of the colour channels in the input tensor
 * @param mean per-channel mean subtracted after scaling, in RGB order (reordered with the channels for BGR)
 * @param std per-channel divisor, positive, in RGB order
 * @param scale multiplies the 0..255 codes first, positive (1/255 maps to [0, 1])
 * @param layout input tensor layout; a 4-D output is pooled over its spatial axes in the same layout
 * @param outputName the output tensor to read; empty for the model's first output
 * @param globalAveragePool whether a 4-D output (a feature map) is averaged over its spatial axes; when off it is
 *     flattened
 */
public record ModelDescription(
    Path modelFile,
    int inputWidth,
    int inputHeight,
    ChannelOrder channelOrder,
    float[] mean,
    float[] std,
    float scale,
    Layout layout,
    String outputName,
    boolean globalAveragePool) {

  /** Channel order of the input tensor. */
  public enum ChannelOrder {
    RGB,
    BGR
  }

  /** Axis order of the input tensor: batch, channels, height, width or batch, height, width, channels. */
  public enum Layout {
    NCHW,
    NHWC
  }

  private static final int MAX_SIZE = 4096;

  public ModelDescription {
    if (modelFile == null) {
      throw new MorphscoutException("The model description names no ONNX model file.");
    }
    if (inputWidth < 1 || inputWidth > MAX_SIZE || inputHeight < 1 || inputHeight > MAX_SIZE) {
      throw new MorphscoutException(
          "Model input size " + inputWidth + "x" + inputHeight + " for " + modelFile + " must be 1.." + MAX_SIZE + " px.");
    }
    if (channelOrder == null || layout == null || outputName == null) {
      throw new MorphscoutException("The model description for " + modelFile + " misses channel order, layout or output.");
    }
    if (mean == null || mean.length != 3 || std == null || std.length != 3) {
      throw new MorphscoutException("The model description for " + modelFile + " needs exactly 3 mean and 3 std values.");
    }
    for (int c = 0; c < 3; c++) {
      if (!Float.isFinite(mean[c]) || !Float.isFinite(std[c]) || std[c] <= 0f) {
        throw new MorphscoutException(
            "The model description for " + modelFile + " has a bad mean/std: std must be positive and all finite.");
      }
    }
    if (!(scale > 0f) || !Float.isFinite(scale)) {
      throw new MorphscoutException("The model description for " + modelFile + " has a bad scale: " + scale);
    }
    mean = mean.clone();
    std = std.clone();
  }

  /** ImageNet-style defaults for {@code modelFile} (see the class comment). */
  public static ModelDescription defaults(Path modelFile) {
    return new ModelDescription(
        modelFile,
        224,
        224,
        ChannelOrder.RGB,
        new float[] {0.485f, 0.456f, 0.406f},
        new float[] {0.229f, 0.224f, 0.225f},
        1f / 255f,
        Layout.NCHW,
        "",
        true);
  }

  @Override
  public float[] mean() {
    return mean.clone();
  }

  @Override
  public float[] std() {
    return std.clone();
  }

  /**
   * Reads a description from a small JSON file. Keys: {@code model} (required; a path, relative to the JSON file's
   * folder unless absolute), and optionally {@code inputWidth}, {@code inputHeight}, {@code channelOrder}
   * ("RGB"/"BGR"), {@code mean}, {@code std}, {@code scale}, {@code layout} ("NCHW"/"NHWC"), {@code output},
   * {@code globalAveragePool}; missing keys take the defaults. Unknown keys are an error, so typos do not pass
   * silently.
   *
   * @throws IOException when the file cannot be read
   * @throws MorphscoutException when it is not valid JSON or not a valid description
   */
  public static ModelDescription fromJson(Path jsonFile) throws IOException {
    Json json;
    try {
      json = new ObjectMapper().readValue(Files.readString(jsonFile), Json.class);
    } catch (JacksonException e) {
      throw new MorphscoutException(
          "The model description " + jsonFile + " is not valid: " + e.getOriginalMessage(), e);
    }
    if (json.model() == null || json.model().isBlank()) {
      throw new MorphscoutException("The model description " + jsonFile + " has no \"model\" path.");
    }
    Path dir = jsonFile.toAbsolutePath().getParent();
    Path model = dir.resolve(json.model());
    ModelDescription d = defaults(model);
    try {
      return new ModelDescription(
          model,
          json.inputWidth() != null ? json.inputWidth() : d.inputWidth(),
          json.inputHeight() != null ? json.inputHeight() : d.inputHeight(),
          json.channelOrder() != null ? ChannelOrder.valueOf(json.channelOrder().toUpperCase()) : d.channelOrder(),
          json.mean() != null ? json.mean() : d.mean(),
          json.std() != null ? json.std() : d.std(),
          json.scale() != null ? json.scale() : d.scale(),
          json.layout() != null ? Layout.valueOf(json.layout().toUpperCase()) : d.layout(),
          json.output() != null ? json.output() : d.outputName(),
          json.globalAveragePool() != null ? json.globalAveragePool() : d.globalAveragePool());
    } catch (IllegalArgumentException e) {
      throw new MorphscoutException(
          "The model description " + jsonFile + " has an unknown channel order or layout (use RGB/BGR, NCHW/NHWC).", e);
    }
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof ModelDescription m
        && m.modelFile.equals(modelFile)
        && m.inputWidth == inputWidth
        && m.inputHeight == inputHeight
        && m.channelOrder == channelOrder
        && Arrays.equals(m.mean, mean)
        && Arrays.equals(m.std, std)
        && m.scale == scale
        && m.layout == layout
        && m.outputName.equals(outputName)
        && m.globalAveragePool == globalAveragePool;
  }

  @Override
  public int hashCode() {
    return modelFile.hashCode() * 31 + Arrays.hashCode(mean) * 17 + Arrays.hashCode(std) + inputWidth * 7 + inputHeight;
  }

  @Override
  public String toString() {
    return "ModelDescription[" + modelFile + ", " + inputWidth + "x" + inputHeight + ", " + channelOrder + ", "
        + layout + ", mean=" + Arrays.toString(mean) + ", std=" + Arrays.toString(std) + ", scale=" + scale
        + ", output=" + (outputName.isEmpty() ? "(first)" : outputName) + ", pool=" + globalAveragePool + "]";
  }

  /** The JSON shape; boxed types tell missing keys from given ones. */
  @JsonIgnoreProperties(ignoreUnknown = false)
  record Json(
      String model,
      Integer inputWidth,
      Integer inputHeight,
      String channelOrder,
      float[] mean,
      float[] std,
      Float scale,
      String layout,
      String output,
      Boolean globalAveragePool) {}
}
