code.scan(/([0-9]+)([^0-9])/).map { |count, char| char * count.to_i }.join
end
