/**
 * The Walk pane: order a selection or a folder into a smooth sequence, show each step's size along the strip,
 * move images and see the steps change, export the order as CSV (RFC 4180).
 */
package org.morphscout.app.gui.walk;
