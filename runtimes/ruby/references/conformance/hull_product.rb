serials.reduce(1, :*)
end
