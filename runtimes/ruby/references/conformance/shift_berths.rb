owners.to_h { |berth, vessel| [berth + offset, vessel] }
end
