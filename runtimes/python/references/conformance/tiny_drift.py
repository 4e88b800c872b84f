return [offset * factor for offset in offsets]
