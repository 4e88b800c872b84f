numbers = $stdin.read.split.map(&:to_i)
weights = numbers[1, numbers[0]]
puts "#{weights.sum} #{weights.max}"
