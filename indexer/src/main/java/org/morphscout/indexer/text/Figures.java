package org.morphscout.indexer.text;

import java.math.BigDecimal;
import java.math.MathContext;

/** Numbers written for people: the contact sheets' arrows, the browser's walk strip. */
public final class Figures {
  private Figures() {}

  /**
   * {@code value} to three significant digits in plain notation (0.0213, 0.156, 40.5, 67.0; "0" for zero, "–" when
   * not finite), so small step costs that differ are not all printed as the same two decimals.
   */
  public static String threeDigits(double value) {
    if (!Double.isFinite(value)) {
      return "–";
    }
    if (value == 0) {
      return "0";
    }
    BigDecimal rounded = new BigDecimal(value).round(new MathContext(3));
    int integerDigits = rounded.precision() - rounded.scale(); // 2 for 67, 0 for 0.5, -1 for 0.0213
    // trailing zeros written (67.0, 0.500): every label shows the same precision
    return rounded.setScale(Math.max(0, 3 - integerDigits), java.math.RoundingMode.HALF_EVEN).toPlainString();
  }
}
