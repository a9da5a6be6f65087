-- The units a design was last shown in on its bench ("inch/lbf"); NULL for designs saved before.
ALTER TABLE designs ADD COLUMN units VARCHAR(40);
