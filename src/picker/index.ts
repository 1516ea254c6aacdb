export * from "./pickerModel.js";
export * from "./loadPickerWell.js";
export * from "./pageHtml.js";
export * from "./clientBundle.js";
export * from "./server.js";
export * from "./runPickerCommand.js";
