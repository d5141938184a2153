-- A small pixel fingerprint per image (analysis.PixelFingerprint: 32 x 32 z-normalised luminance cells around the
-- object, little-endian IEEE 754 binary16), for telling edited copies from similar shots. NULL for features stored before this
-- version: the next index run analyses those images again and fills it in.

ALTER TABLE features ADD COLUMN fingerprint BLOB;
