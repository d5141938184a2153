/**
 * The invented demo library of Morphscout: product pictures of the fictional ceramics studio
 * "Quernhollow Ceramics", drawn from scratch with Java2D (headless, CPU only), plus small image families with known
 * ground truth for other modules' tests. Public API; depends on SLF4J only.
 *
 * <p>Everything is deterministic from a seed: the same seed gives the same bytes on the same JDK. Randomness comes
 * from {@link java.util.SplittableRandom} and a SplitMix64 hash (Steele, Lea and Flood, "Fast splittable
 * pseudorandom number generators", OOPSLA 2014); rendering maths uses {@link java.lang.StrictMath} so that JIT
 * intrinsics cannot change a pixel; nothing depends on time, hash order or thread scheduling.
 *
 * <p>Pieces and the published methods they use:
 * <ul>
 *   <li>{@link org.morphscout.demo.VesselProfile}: a lathe profile (radius as a function of height) through seven
 *       stations, interpolated with the monotone piecewise cubic Hermite scheme of Fritsch and Carlson
 *       ("Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17(2), 1980), so the curve never overshoots
 *       its stations (no negative radius, no false bulges); {@code blend} mixes two profiles station by station.</li>
 *   <li>{@link org.morphscout.demo.VesselRenderer}: silhouette of the mirrored profile seen slightly from above,
 *       Lambert diffuse plus Blinn-Phong highlights (Blinn, "Models of light reflection for computer synthesized
 *       pictures", SIGGRAPH 1977), glaze textures from value noise and cellular noise (Worley, "A cellular texture
 *       basis function", SIGGRAPH 1996), and the exact ground-truth mask (pixel centres inside the shape).</li>
 *   <li>{@link org.morphscout.demo.DemoLibrary}: writes the library folder, its {@code manifest.csv} and
 *       {@code README.txt}.</li>
 *   <li>{@link org.morphscout.demo.TestFamilies}: silhouette families with a known blend parameter, planted
 *       compatible pairs, near-duplicates.</li>
 * </ul>
 *
 * <p>All classes are immutable or thread-confined; renderers and generators may be used from several threads.
 */
package org.morphscout.demo;
