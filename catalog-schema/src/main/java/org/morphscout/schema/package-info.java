/**
 * The catalog's SQL layout: numbered, append-only layout steps bundled as resources
 * ({@code org/morphscout/schema/layout/step-NN-name.sql}, listed in {@code steps.txt}) and the code that applies them.
 * Each step runs in its own transaction and records a row (number, file name, SHA-256 of its text, time) in the
 * {@code catalog_layout} table; a database holding a step this build does not know is refused before anything is
 * written. Catalogs written before this bookkeeping existed (a {@code schema_version} table) are converted in place.
 */
package org.morphscout.schema;
