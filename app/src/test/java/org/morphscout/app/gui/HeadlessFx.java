package org.morphscout.app.gui;

import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Sets the system properties that make TestFX run on the headless Monocle platform with software rendering. Call
 * {@link #configure()} before the toolkit starts (a static initializer of the test class).
 */
public final class HeadlessFx {
  private HeadlessFx() {}

  public static void configure() {
    setIfAbsent("testfx.robot", "glass");
    setIfAbsent("testfx.headless", "true");
    setIfAbsent("prism.order", "sw");
    setIfAbsent("prism.text", "t2k");
    setIfAbsent("java.awt.headless", "true");
    setIfAbsent("glass.platform", "Monocle");
    setIfAbsent("monocle.platform", "Headless");
    setIfAbsent("headless.geometry", "1600x1000-32");
  }

  /** Waits until {@code condition}, evaluated on the FX thread, holds; fails after {@code seconds}. */
  public static void waitUntil(long seconds, BooleanSupplier condition) throws Exception {
    WaitForAsyncUtils.waitFor(seconds, TimeUnit.SECONDS,
        () -> WaitForAsyncUtils.asyncFx(condition::getAsBoolean).get());
  }

  private static void setIfAbsent(String key, String value) {
    if (System.getProperty(key) == null) {
      System.setProperty(key, value);
    }
  }
}
