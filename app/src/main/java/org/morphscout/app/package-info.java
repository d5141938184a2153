/** Morphscout's application layer: the command line ({@code cli}) and the JavaFX desktop browser ({@code gui}). */
package org.morphscout.app;
