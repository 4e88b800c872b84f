seen = Set.new
# Set#add? returns nil when the code was already there.
tickets.find { |code| !seen.add?(code) }
end
