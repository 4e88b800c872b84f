# Split on the space character only: String#split(" ") would also split on tabs and newlines.
full_name.split(/ /).map { |word| word[0].tr("a-z", "A-Z") }.join
end
