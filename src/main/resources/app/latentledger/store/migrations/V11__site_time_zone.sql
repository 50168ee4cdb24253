-- Version 11: a site's time zone, an IANA region id such as 'America/Chicago'. A logger's clock
-- times written without a UTC offset are read in it when the tech chooses no other zone. NULL for
-- a site without one (every site kept before this version): the tablet's zone is used then.
ALTER TABLE site ADD COLUMN time_zone TEXT;
