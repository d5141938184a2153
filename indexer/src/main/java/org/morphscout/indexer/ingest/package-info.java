/**
 * Ingestion: finding image files in a user's library, decoding them robustly into small sRGB analysis images,
 * applying the EXIF orientation, writing thumbnails and hashing file content. This package is API: the indexer
 * calls {@link org.morphscout.indexer.ingest.LibraryScanner} (with {@link org.morphscout.indexer.ingest.ScanOptions}),
 * an {@link org.morphscout.indexer.ingest.ImageDecoder} ({@link org.morphscout.indexer.ingest.ImageIoDecoder},
 * usually wrapped in a {@link org.morphscout.indexer.ingest.TimeLimitedDecoder}) configured by
 * {@link org.morphscout.indexer.ingest.DecodeOptions}, {@link org.morphscout.indexer.ingest.Thumbnails} and
 * {@link org.morphscout.indexer.ingest.ContentHash}. {@link org.morphscout.indexer.ingest.Orientation},
 * {@link org.morphscout.indexer.ingest.FormatSniffer} and {@link org.morphscout.indexer.ingest.AreaDownscaler} are
 * pure helpers usable on their own.
 *
 * <p>Which decoder path a file takes: the magic bytes decide the format (never the file name); JPEG, PNG, GIF,
 * BMP, TIFF and WebP decode through ImageIO with the TwelveMonkeys plugins; HEIC/HEIF, AVIF, JPEG XL and camera
 * raw are recognised and refused as "unsupported format (...)".
 *
 * <p>Per-file failures are {@link org.morphscout.indexer.ingest.ImageReadException}s whose
 * {@link org.morphscout.indexer.ingest.ImageReadException#reason() reason} is a short phrase from a small stable
 * vocabulary ({@link org.morphscout.indexer.ingest.ReadFailure}) the catalog can store beside the path.
 *
 * <p>References:
 * <ul>
 *   <li>CIPA DC-008-2019 (Exif 2.32), tag 0x0112 Orientation: the eight values and their meaning.</li>
 *   <li>ITU-T T.81 | ISO/IEC 10918-1 (JPEG), Annex B: marker and segment structure (SOI, SOS, EOI, byte stuffing).</li>
 *   <li>ISO/IEC 15948 (PNG), section 5: datastream structure (signature, chunks, IHDR, IEND).</li>
 *   <li>ISO/IEC 23008-12 (HEIF) and ISO/IEC 14496-12 (ISO base media file format): the {@code ftyp} box brands.</li>
 *   <li>RFC 9649 (WebP Image Format): RIFF container and VP8/VP8L/VP8X chunks.</li>
 *   <li>FIPS 180-4: SHA-256.</li>
 * </ul>
 */
package org.morphscout.indexer.ingest;
