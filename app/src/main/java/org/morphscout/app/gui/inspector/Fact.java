package org.morphscout.app.gui.inspector;

/** One labelled line of the inspector ("Size", "4032 x 3024 px"). */
public record Fact(String label, String value) {}
