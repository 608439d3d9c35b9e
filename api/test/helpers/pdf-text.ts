import { execFile } from 'node:child_process';

/**
 * The text of a PDF, read back with pdf-parse (pdf.js) in a child Node process: pdf.js loads its worker
 * through a dynamic import, which jest's module sandbox refuses.
 */
export function pdfText(content: Buffer): Promise<string> {
  const script =
    "const { PDFParse } = require('pdf-parse'); const chunks = []; process.stdin.on('data', (c) => chunks.push(c));" +
    "process.stdin.on('end', async () => { const parser = new PDFParse({ data: new Uint8Array(Buffer.concat(chunks)) });" +
    'const result = await parser.getText(); await parser.destroy(); process.stdout.write(JSON.stringify({ text: result.text, pages: result.total })); });';
  return new Promise((resolve, reject) => {
    const child = execFile(process.execPath, ['-e', script], { cwd: __dirname, maxBuffer: 20 * 1024 * 1024 }, (error, stdout, stderr) => {
      if (error) return reject(new Error(`pdf-parse failed: ${stderr || error.message}`));
      resolve((JSON.parse(stdout) as { text: string }).text);
    });
    child.stdin!.end(content);
  });
}
