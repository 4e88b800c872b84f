# Only spaces and tabs are trimmed; String#strip would also remove other whitespace.
trim = ->(part) { part.gsub(/\A[ \t]+|[ \t]+\z/, "") }
text.split("\n").each_with_object(Hash.new(0)) do |line, totals|
  next if trim.call(line).empty?

  name, quantity = line.split(":", 2)
  totals[trim.call(name)] += Integer(trim.call(quantity), 10)
end
end
