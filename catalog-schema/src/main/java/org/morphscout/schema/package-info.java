/**
 * The catalog's SQL schema: numbered, append-only migrations bundled as resources
 * ({@code org/morphscout/schema/migrations/V###__name.sql}, listed in {@code index.txt}) and the code that applies
 * them. Each migration runs in its own transaction and records a row in {@code schema_version}; a database whose
 * version is newer than the newest bundled migration is refused before anything is written.
 */
package org.morphscout.schema;
