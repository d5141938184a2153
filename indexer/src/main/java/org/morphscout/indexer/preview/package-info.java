/**
 * Previews for judging pairs before anything is rendered: a rough morph between two images made from the warp the
 * pair scorer estimated ({@link org.morphscout.indexer.preview.PreviewMorph}), written as an animated GIF
 * ({@link org.morphscout.indexer.preview.AnimatedGifWriter}) or a PNG strip of frames
 * ({@link org.morphscout.indexer.preview.FrameStrip}), and contact sheets of images.
 *
 * <p>The morph is the classic warp-and-dissolve (Beier and Neely 1992, "Feature-based image metamorphosis",
 * SIGGRAPH, describe the scheme with line features; here the correspondence is the dense field of
 * {@link org.morphscout.indexer.warp}): each in-between frame warps both images towards the intermediate shape and
 * cross-dissolves them. It is a preview, not a renderer: frames are small, sampling is bilinear and the backward
 * mapping is approximated. GIF output uses the JDK's ImageIO GIF writer with the NETSCAPE2.0 application extension
 * for looping. API; classes are immutable and thread-safe.
 */
package org.morphscout.indexer.preview;
