// The form kit reads and writes its texts with the one units module; these are its older names for them.
export {
  lengthFieldText as lengthText,
  numberFieldText as numberText,
  parseLengthText,
  parseNumberText,
  type NumberParse,
} from "@/model/units";
