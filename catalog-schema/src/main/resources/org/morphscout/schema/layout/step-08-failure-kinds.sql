-- Why a file failed, as a value: the indexer decides whether to try a failed file again from these columns, never
-- from the wording of the reason shown to people. NULL in both for failures recorded before this step (the indexer
-- then reads the reason as it did before). Append-only: never edit a layout step that has shipped.

ALTER TABLE failures ADD COLUMN kind TEXT;             -- a library.FailureKind name, e.g. TRUNCATED, TIMED_OUT
ALTER TABLE failures ADD COLUMN declared_pixels INTEGER; -- TOO_LARGE: the pixel count the file declared
