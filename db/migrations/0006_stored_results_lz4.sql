-- Stored results are tens of KB of JSON, written after every change and read on every request that
-- misses the app's kept copy: lz4 compresses them about twice as fast as the default pglz (about 2 ms
-- off each store of a 300-performer analysis on the development machine). Only where the server was
-- built with lz4; elsewhere the column keeps the default.
DO $$
BEGIN
  IF EXISTS (SELECT 1 FROM pg_settings WHERE name = 'default_toast_compression' AND 'lz4' = ANY (enumvals)) THEN
    ALTER TABLE analyses ALTER COLUMN result SET COMPRESSION lz4;
    ALTER TABLE balance_sweeps ALTER COLUMN result SET COMPRESSION lz4;
  END IF;
END $$;
