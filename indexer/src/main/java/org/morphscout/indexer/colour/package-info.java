/**
 * Colour spaces shared by the analysis steps: {@link org.morphscout.indexer.colour.CieLab} converts 8-bit sRGB
 * (IEC 61966-2-1) to CIELAB (D65) and back. It sits below both the silhouette extractors (the classical one models
 * the backdrop in CIELAB) and the feature extractors (colour statistics), so neither depends on the other for it.
 */
package org.morphscout.indexer.colour;
