balance = 0
deltas.map { |delta| balance += delta }
end
