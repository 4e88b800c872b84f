flags.map { |flag| !flag }
end
