kept = plate.delete("^A-Za-z0-9").downcase
kept == kept.reverse
end
