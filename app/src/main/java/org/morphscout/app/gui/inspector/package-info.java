/**
 * The Inspector: the selected image large with its silhouette as an optional overlay, its facts (size, format,
 * findings, CIELAB colour statistics shown as sRGB swatches per IEC 61966-2-1, failures) and the actions on it.
 */
package org.morphscout.app.gui.inspector;
