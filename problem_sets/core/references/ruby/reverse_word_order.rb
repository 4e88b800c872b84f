# Split on the space character only: String#split(" ") would also split on tabs and newlines.
line.split(/ +/).reject(&:empty?).reverse.join(" ")
end
