(1..count).reject { |berth| taken.include?(berth) }.to_set
end
